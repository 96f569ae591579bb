using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax;

/// <summary>
/// A parsed sheet: its text, every token (trivia included, so the tokens reproduce the text),
/// the statements in order and the syntax diagnostics. Parsing never throws.
/// </summary>
public sealed class SheetSyntax
{
    /// <summary>The tokens without whitespace, as the parser read them.</summary>
    private readonly SyntaxToken[] _tokensWithoutWhitespace;

    /// <summary>Every token, made from <see cref="_tokensWithoutWhitespace"/> when first asked for.</summary>
    private SyntaxToken[]? _tokens;

    internal SheetSyntax(SourceText source, SyntaxToken[] tokensWithoutWhitespace, IReadOnlyList<StatementSyntax> statements, IReadOnlyList<Diagnostic> diagnostics)
    {
        Source = source;
        _tokensWithoutWhitespace = tokensWithoutWhitespace;
        Statements = statements;
        Diagnostics = diagnostics;
    }

    public SourceText Source { get; }

    /// <summary>
    /// Every token, whitespace included, exactly as <see cref="Tokenizer.Tokenize(string)"/> gives them.
    /// Only the editor asks for them, so the whitespace tokens (half of all) are put back on first use,
    /// not stored by every parse. Two threads asking at once may both build the list; one is kept.
    /// </summary>
    public IReadOnlyList<SyntaxToken> Tokens =>
        _tokens ?? Interlocked.CompareExchange(ref _tokens, WhitespaceTokens.Restore(_tokensWithoutWhitespace, Source.Length), null) ?? _tokens;

    public IReadOnlyList<StatementSyntax> Statements { get; }

    public IReadOnlyList<Diagnostic> Diagnostics { get; }

    /// <summary>The text again, from the tokens: equal to the source for every input.</summary>
    public string Print()
    {
        var sb = new System.Text.StringBuilder(Source.Length);
        foreach (var t in Tokens) sb.Append(Source.Text, t.Start, t.Length);
        return sb.ToString();
    }

    /// <summary>Parses sheet text; never throws.</summary>
    public static SheetSyntax Parse(string text, string? path = null) => Parsing.SheetParser.Parse(new SourceText(text, path));

    public static SheetSyntax Parse(SourceText source) => Parsing.SheetParser.Parse(source);
}
