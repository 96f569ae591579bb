using System.Text;
using CutSheet.Editing.Analysis;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Editing.Values;

/// <summary>
/// A formula with each name replaced by its value as shown (<c>T_hold / r_grip</c> →
/// <c>0.8309 N·m / 60.00 mm</c>), so a reviewer can redo the arithmetic by hand. Names whose
/// value is unknown stay as written.
/// </summary>
public static class FormulaSubstitution
{
    public static string Substitute(SheetAnalysis analysis, ExpressionSyntax expression)
    {
        var span = expression.Span;
        var text = new StringBuilder();
        int at = span.Start;
        int digits = analysis.Result.Display.Digits;
        foreach (var occurrence in analysis.Index.Occurrences)
        {
            if (occurrence.Span.Start < at || occurrence.Span.End > span.End || occurrence.IsDeclaration) continue;
            string? value = occurrence.Target.Symbol is DefinitionSymbol d ? ValueOf(analysis, d, digits) : null;
            if (value is null) continue;
            // A qualified name (x.T) is replaced whole, qualifier included.
            int start = occurrence.Span.Start;
            while (start > at && analysis.Text[start - 1] == '.') start = QualifierStart(analysis.Text, start - 1, at);
            // A value with a unit or a sign before a power or after a minus is bracketed: '1.250 in^2' would square the unit only.
            int after = occurrence.Span.End;
            bool power = after < analysis.Text.Length && (analysis.Text[after] == '^' || Language.Units.Superscript.IsSuperscriptChar(analysis.Text[after]));
            bool negated = start > 0 && analysis.Text[..start].TrimEnd().EndsWith('-');
            if ((power && (value.Contains(' ') || value.StartsWith('-'))) || (negated && value.StartsWith('-'))) value = "(" + value + ")";
            text.Append(analysis.Text, at, start - at).Append(value);
            at = occurrence.Span.End;
        }
        text.Append(analysis.Text, at, span.End - at);
        return text.ToString();
    }

    private static int QualifierStart(string text, int dot, int floor)
    {
        int i = dot;
        while (i > floor && (char.IsLetterOrDigit(text[i - 1]) || text[i - 1] == '_')) i--;
        return i;
    }

    private static string? ValueOf(SheetAnalysis analysis, DefinitionSymbol d, int digits)
    {
        if (d.Path == analysis.Path && analysis.Result.Definitions.FirstOrDefault(r => r.Definition.NameSpan == d.Syntax.NameSpan) is { } own)
            return own.Value?.Primary;
        return ValueText.Of(d, digits);
    }
}
