using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// What parsing one statement gave, kept on the sheet's syntax so that the next parse of an edited
/// version can take it over when the statement is unchanged: where its text lies, a hash of its
/// tokens (kinds, places, flags, and the comment that is its description), the node (null when the
/// statement gave none) and the range of the sheet's syntax diagnostics it reported.
/// </summary>
internal readonly record struct StatementRecord(int Start, int End, ulong TokenHash, StatementSyntax? Statement, int DiagnosticStart, int DiagnosticCount)
{
    /// <summary>The extent and token hash of a group of significant tokens and its comment.</summary>
    public static (int Start, int End, ulong Hash) Describe(ReadOnlySpan<SyntaxToken> tokens, SyntaxToken? comment)
    {
        // FNV-1a over the fields that the statement's parse reads besides the text.
        ulong hash = 14695981039346656037UL;
        void Mix(int value)
        {
            hash ^= (uint)value;
            hash *= 1099511628211UL;
        }
        foreach (var t in tokens)
        {
            Mix((int)t.Kind);
            Mix(t.Start);
            Mix(t.Length);
            Mix((int)t.Flags);
        }
        int end = tokens[^1].End;
        if (comment is { } c)
        {
            Mix(c.Start);
            Mix(c.Length);
            end = Math.Max(end, c.End);
        }
        return (tokens[0].Start, end, hash);
    }
}
