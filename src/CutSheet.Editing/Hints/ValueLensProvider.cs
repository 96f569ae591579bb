using CutSheet.Editing.Analysis;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Hints;

/// <summary>The texts of <see cref="ValueHintProvider"/>, placed over their statements' first lines, name first.</summary>
public static class ValueLensProvider
{
    public static IReadOnlyList<ValueLens> Lenses(SheetAnalysis analysis, HintOptions options)
    {
        var statements = analysis.Result.Statements.GroupBy(s => s.Line).ToDictionary(g => g.Key, g => g.First());
        return ValueHintProvider.Hints(analysis, options)
            .Select(h =>
            {
                var statement = statements[h.Line];
                int lineEnd = analysis.Source.LineEnd(h.Line);
                string title = statement is Language.Results.DefinitionResult d ? d.Name + " " + h.Label : h.Label;
                return new ValueLens(TextSpan.FromBounds(statement.Span.Start, Math.Min(statement.Span.End, lineEnd)), title);
            })
            .ToList();
    }
}
