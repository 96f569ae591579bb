using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Library;

/// <summary>
/// Where a missing <c>use LIBRARY</c> line goes in a sheet: after its last import, or else
/// before its first statement that is not a heading, a <c>sheet</c> line or a <c>display</c>
/// line. One rule for the fix of an unknown name and for an editor's completion that imports.
/// </summary>
public static class UseLineEdit
{
    /// <summary>The edit that adds <c>use <paramref name="library"/></c> to the sheet.</summary>
    public static TextEdit For(SheetSyntax syntax, string library)
    {
        var source = syntax.Source;
        string text = source.Text;
        string newline = text.Contains("\r\n", StringComparison.Ordinal) ? "\r\n" : "\n";
        var lastUse = syntax.Statements.LastOrDefault(s => s is UseSyntax);
        if (lastUse is not null)
        {
            int line = source.GetPosition(lastUse.Span.End).Line;
            return line + 1 < source.LineCount
                ? new TextEdit(new TextSpan(source.LineStart(line + 1), 0), $"use {library}{newline}")
                : new TextEdit(new TextSpan(text.Length, 0), $"{newline}use {library}");
        }
        var first = syntax.Statements.FirstOrDefault(s => s is not (HeadingSyntax or SheetMetadataSyntax or DisplaySyntax));
        int at = first is null ? text.Length : source.LineStart(source.GetPosition(first.Span.Start).Line);
        bool newlineBefore = at == text.Length && at > 0 && text[at - 1] != '\n';
        return new TextEdit(new TextSpan(at, 0), newlineBefore ? $"{newline}use {library}{newline}" : $"use {library}{newline}");
    }
}
