using CutSheet.Editing.Analysis;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Fixes;

/// <summary>The fixes of the sheet's own diagnostics whose span meets the given range (the cursor or a selection).</summary>
public static class FixProvider
{
    public static IReadOnlyList<FixOffer> Fixes(SheetAnalysis analysis, TextSpan range) =>
        analysis.Result.Diagnostics
            .Where(d => d.Path is null && d.Fixes.Count > 0 && Meets(d.Span, range))
            .SelectMany(d => d.Fixes.Select(f => new FixOffer(d, f)))
            .ToList();

    private static bool Meets(TextSpan a, TextSpan b) => a.Start <= b.End && b.Start <= a.End;
}
