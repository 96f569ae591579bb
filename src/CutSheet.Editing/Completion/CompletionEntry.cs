using CutSheet.Language.Text;

namespace CutSheet.Editing.Completion;

/// <summary>
/// One completion: <see cref="InsertText"/> replaces <see cref="Replace"/> (the partly typed
/// word); <see cref="FilterText"/> is what the typed text is matched against.
/// </summary>
public sealed record CompletionEntry(
    string Label, CompletionCategory Category, string InsertText, TextSpan Replace,
    string? Detail = null, string? Documentation = null, string? SortText = null, string? FilterText = null);
