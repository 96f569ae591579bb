using CutSheet.Language.Text;

namespace CutSheet.Editing.Highlighting;

/// <summary>A coloured span; spans never overlap and come in text order.</summary>
public sealed record HighlightSpan(TextSpan Span, HighlightCategory Category, HighlightModifiers Modifiers = HighlightModifiers.None);
