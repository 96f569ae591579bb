using CutSheet.Language.Text;

namespace CutSheet.Editing.Navigation;

/// <summary>Replace <see cref="Span"/> in the sheet at <see cref="Path"/> (measured in <see cref="Text"/>) with <see cref="NewText"/>.</summary>
public sealed record SheetEdit(string? Path, TextSpan Span, string NewText, SourceText? Text);
