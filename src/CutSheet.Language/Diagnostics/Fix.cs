namespace CutSheet.Language.Diagnostics;

/// <summary>A fix offered for a diagnostic, as data: a title and the edits that make it.</summary>
public sealed record Fix(string Title, IReadOnlyList<TextEdit> Edits);
