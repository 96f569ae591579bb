using CutSheet.Language.Text;

namespace CutSheet.Language.Diagnostics;

/// <summary>Replace <see cref="Span"/> of the sheet at <see cref="Path"/> (null: the sheet itself) with <see cref="NewText"/>.</summary>
public sealed record TextEdit(TextSpan Span, string NewText, string? Path = null);
