using CutSheet.Language.Text;

namespace CutSheet.Editing.Navigation;

/// <summary>
/// A span in a sheet: <see cref="Path"/> is a full path, a library label
/// (<c>library/NAME.cutsheet</c>) or null for a sheet without a file; <see cref="Text"/> is the
/// text the span was measured in, when known (an open editor's text may differ from the disk).
/// </summary>
public sealed record SheetLocation(string? Path, TextSpan Span, SourceText? Text);
