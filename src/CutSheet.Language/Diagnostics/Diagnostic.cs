using CutSheet.Language.Text;

namespace CutSheet.Language.Diagnostics;

/// <summary>
/// A finding about a sheet: a stable <c>CUT</c> code, a severity, a span in the sheet at
/// <see cref="Path"/> (null: the sheet being evaluated), a message, related locations and fixes.
/// </summary>
public sealed record Diagnostic(
    string Code,
    Severity Severity,
    TextSpan Span,
    string Message,
    IReadOnlyList<RelatedLocation> Related,
    IReadOnlyList<Fix> Fixes,
    string? Path = null)
{
    public static Diagnostic Create(string code, Severity severity, TextSpan span, string message, Fix? fix = null, RelatedLocation? related = null) =>
        new(code, severity, span, message, related is null ? [] : [related], fix is null ? [] : [fix]);

    public static Diagnostic Error(string code, TextSpan span, string message, Fix? fix = null) => Create(code, Severity.Error, span, message, fix);

    public static Diagnostic Warning(string code, TextSpan span, string message, Fix? fix = null) => Create(code, Severity.Warning, span, message, fix);

    public static Diagnostic Info(string code, TextSpan span, string message, Fix? fix = null) => Create(code, Severity.Information, span, message, fix);
}
