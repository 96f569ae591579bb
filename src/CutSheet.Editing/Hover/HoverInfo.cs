using CutSheet.Language.Text;

namespace CutSheet.Editing.Hover;

/// <summary>Hover content as Markdown, and the span of the sheet it describes.</summary>
public sealed record HoverInfo(TextSpan Span, string Markdown);
