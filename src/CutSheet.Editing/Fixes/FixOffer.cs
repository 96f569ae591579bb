using CutSheet.Language.Diagnostics;

namespace CutSheet.Editing.Fixes;

/// <summary>A fix the language offers for a diagnostic of this sheet.</summary>
public sealed record FixOffer(Diagnostic Diagnostic, Fix Fix);
