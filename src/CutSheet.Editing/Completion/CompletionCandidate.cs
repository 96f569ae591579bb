namespace CutSheet.Editing.Completion;

/// <summary>
/// A completion before ranking: its <see cref="Match"/> (see <see cref="CompletionMatch"/>), its
/// group, and its distance from the cursor (0 when it has no place in the sheet).
/// </summary>
public readonly record struct CompletionCandidate(CompletionEntry Entry, int Match, CompletionGroup Group, int Distance);
