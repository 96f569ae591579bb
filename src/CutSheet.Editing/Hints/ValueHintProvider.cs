using CutSheet.Editing.Analysis;
using CutSheet.Language.Results;

namespace CutSheet.Editing.Hints;

/// <summary>
/// The value of each computed line, written after its formula (<c>→ 13.85 N</c>), and each
/// check's outcome with its utilisation and margin. Inputs are labelled only when asked: their
/// value is already on the line. Code lenses carry the same texts for editors without hints.
/// </summary>
public static class ValueHintProvider
{
    public const string ValueArrow = "→ ";

    public static IReadOnlyList<ValueHint> Hints(SheetAnalysis analysis, HintOptions options, int rangeStart = 0, int rangeEnd = int.MaxValue)
    {
        var hints = new List<ValueHint>();
        if (!options.Enabled) return hints;
        foreach (var statement in analysis.Result.Statements)
        {
            if (statement.Span.End < rangeStart || statement.Span.Start > rangeEnd) continue;
            switch (statement)
            {
                case DefinitionResult d when d.Value is not null && (!d.IsInput || options.IncludeInputs):
                    hints.Add(new ValueHint(d.Definition.Value.Span.End, ValueArrow + d.Value.Text, ValueHintCategory.Value, d.Line));
                    break;
                case CheckResult c:
                    hints.Add(new ValueHint(c.Check.Tolerance?.Span.End ?? c.Check.Condition.Span.End, CheckLabel(c), ValueHintCategory.Check, c.Line));
                    break;
            }
        }
        return hints;
    }

    public static string CheckLabel(CheckResult check)
    {
        var parts = new List<string>
        {
            check.Status switch
            {
                CheckStatus.Passed => "✓ passed",
                CheckStatus.Failed => "✗ FAILED",
                _ => "? not evaluated",
            },
        };
        if (check.Utilisation is { } u) parts.Add($"{u * 100:0.#} % of limit");
        if (check.Margin is not null) parts.Add("margin " + check.Margin.Primary);
        return string.Join(" · ", parts);
    }
}
