using CutSheet.Language.Text;

namespace CutSheet.Editing.Hints;

/// <summary>A line-level label over a statement: the fallback for editors that show no inline hints.</summary>
public sealed record ValueLens(TextSpan Span, string Title);
