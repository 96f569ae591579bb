using System.Text;
using CutSheet.Editing.Analysis;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Formatting;

/// <summary>
/// Tidies a sheet without touching its meaning: one space around <c>=</c>, <c>+</c>, a binary
/// <c>-</c> and comparisons; the <c>=</c> of definitions aligned within each block (lines
/// between blank lines and headings); trailing spaces dropped on the lines it touches.
/// <c>*</c>, <c>/</c> and <c>^</c> are left as written (a space there can change what is a
/// unit), nothing is turned into Unicode, and only one-line statements at the margin are
/// touched. A comment stays on its line and, where room allows, in its column. The result
/// is parsed again; if its tokens or comments differ from the original in any way, the
/// formatter returns no edits at all.
/// </summary>
public static class SheetFormatter
{
    public static IReadOnlyList<TextEdit> Format(SheetAnalysis analysis) => Format(analysis.Result.Syntax);

    public static IReadOnlyList<TextEdit> Format(SheetSyntax syntax)
    {
        var source = syntax.Source;
        var lines = new Dictionary<int, LineLayout>();
        foreach (var statement in syntax.Statements)
        {
            if (statement is not (DefinitionSyntax or CheckSyntax or CautionSyntax)) continue;
            var start = source.GetPosition(statement.Span.Start);
            if (start.Column != 0 || source.GetPosition(statement.Span.End).Line != start.Line) continue;
            var layout = LineLayout.Read(syntax, start.Line, statement);
            if (layout is not null) lines[start.Line] = layout;
        }

        AlignBlocks(syntax, lines);

        var edits = new List<TextEdit>();
        var text = new StringBuilder(source.Length);
        int at = 0;
        foreach (var (line, layout) in lines.OrderBy(l => l.Key))
        {
            string newLine = layout.Render();
            var span = TextSpan.FromBounds(source.LineStart(line), source.LineEnd(line));
            if (newLine == source.Slice(span)) continue;
            edits.Add(new TextEdit(span, newLine));
            text.Append(source.Text, at, span.Start - at).Append(newLine);
            at = span.End;
        }
        if (edits.Count == 0) return edits;
        text.Append(source.Text, at, source.Length - at);
        return SameMeaning(syntax, SheetSyntax.Parse(text.ToString(), source.Path)) ? edits : [];
    }

    private static void AlignBlocks(SheetSyntax syntax, Dictionary<int, LineLayout> lines)
    {
        var source = syntax.Source;
        var block = new List<LineLayout>();
        void Flush()
        {
            int width = block.Count == 0 ? 0 : block.Max(l => l.NameWidth);
            foreach (var l in block) l.AlignTo(width);
            block.Clear();
        }
        for (int line = 0; line < source.LineCount; line++)
        {
            string text = source.LineText(line);
            if (text.Trim().Length == 0 || text.TrimStart().StartsWith('#')) { Flush(); continue; }
            if (lines.TryGetValue(line, out var layout) && layout.IsDefinition) block.Add(layout);
        }
        Flush();
    }

    /// <summary>Same significant tokens with the same texts, same comments, same statements: the edit changed only spacing.</summary>
    private static bool SameMeaning(SheetSyntax before, SheetSyntax after)
    {
        static IEnumerable<(TokenKind, string)> Significant(SheetSyntax s) =>
            s.Tokens.Where(t => t.Kind is not (TokenKind.Whitespace or TokenKind.TriviaNewline)).Select(t => (t.Kind, s.Source.Slice(t.Span)));
        return Significant(before).SequenceEqual(Significant(after))
            && before.Statements.Select(s => s.GetType()).SequenceEqual(after.Statements.Select(s => s.GetType()))
            && before.Diagnostics.Count == after.Diagnostics.Count;
    }
}
