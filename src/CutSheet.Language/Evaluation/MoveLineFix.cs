using CutSheet.Language.Diagnostics;
using CutSheet.Language.Semantics;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// The fix for a name used before its definition: move the definition's line just before the
/// first use — possible only when everything the definition needs is defined above that use.
/// </summary>
internal static class MoveLineFix
{
    /// <param name="lastDependencyLine">The last line among the definition's own dependencies (-1 for none).</param>
    public static Fix? Create(SourceText Source, DefinitionSymbol definition, int useLine, int lastDependencyLine)
    {
        int lastDependency = lastDependencyLine;
        if (lastDependency >= useLine) return null;
        int defStart = Source.LineStart(definition.Line);
        int defEnd = definition.Line + 1 < Source.LineCount ? Source.LineStart(definition.Line + 1) : Source.Length;
        string lineText = Source.Text[defStart..defEnd];
        if (!lineText.EndsWith('\n')) lineText += "\n";
        int insertAt = Source.LineStart(useLine);
        return new Fix(DiagnosticMessages.MoveLineFix(definition.Name, useLine + 1),
            [new TextEdit(new TextSpan(insertAt, 0), lineText), new TextEdit(TextSpan.FromBounds(defStart, defEnd), "")]);
    }
}
