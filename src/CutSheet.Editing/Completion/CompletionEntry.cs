using CutSheet.Language.Text;

namespace CutSheet.Editing.Completion;

/// <summary>
/// One completion: <see cref="InsertText"/> replaces <see cref="Replace"/> (the partly typed
/// word); <see cref="FilterText"/> is what the typed text is matched against. When
/// <see cref="Key"/> is set, more is known than the entry carries (a definition's value,
/// documentation): <see cref="CompletionResolver"/> finds it on request, so that a list of many
/// entries does not compute what the user will look at for one. <see cref="AdditionalEdits"/> are
/// made elsewhere in the sheet when the entry is chosen (the <c>use</c> line of a library name).
/// </summary>
public sealed record CompletionEntry(
    string Label, CompletionCategory Category, string InsertText, TextSpan Replace,
    string? Detail = null, string? Documentation = null, string? SortText = null, string? FilterText = null,
    CompletionKey? Key = null, IReadOnlyList<Language.Diagnostics.TextEdit>? AdditionalEdits = null);
