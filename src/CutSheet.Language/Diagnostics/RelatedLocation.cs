using CutSheet.Language.Text;

namespace CutSheet.Language.Diagnostics;

/// <summary>Another place that explains a diagnostic (e.g. the <c>lb</c> literal behind a mass-for-force error).</summary>
public sealed record RelatedLocation(TextSpan Span, string Message, string? Path = null);
