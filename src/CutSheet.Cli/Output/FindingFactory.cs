using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Output;

/// <summary>Places every diagnostic of a sheet result in its file.</summary>
internal static class FindingFactory
{
    public static IReadOnlyList<Finding> From(SheetResult result, LocationResolver locations) =>
        result.Diagnostics.Select(d => From(d, locations)).ToList();

    public static Finding From(Diagnostic diagnostic, LocationResolver locations)
    {
        var fixes = diagnostic.Fixes
            .Select(f => new FixInfo(
                f.Title,
                f.Edits.Select(e => new EditInfo(locations.DisplayPathOf(e.Path), locations.Resolve(e.Path, e.Span), e.NewText)).ToList()))
            .ToList();
        var related = diagnostic.Related
            .Select(r => new RelatedInfo(locations.DisplayPathOf(r.Path), locations.Resolve(r.Path, r.Span), r.Message))
            .ToList();
        return new Finding(
            diagnostic.Code,
            diagnostic.Severity,
            locations.FullPathOf(diagnostic.Path),
            locations.DisplayPathOf(diagnostic.Path),
            locations.Resolve(diagnostic.Path, diagnostic.Span),
            diagnostic.Message,
            fixes,
            related);
    }
}
