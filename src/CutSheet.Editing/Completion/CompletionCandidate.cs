namespace CutSheet.Editing.Completion;

/// <summary>
/// A completion before ranking: its label, its <see cref="Match"/> (see <see cref="CompletionMatch"/>),
/// its group, and its distance from the cursor (0 when it has no place in the sheet). Either the
/// finished <see cref="Entry"/> or the <see cref="Symbol"/> it will be built from: a sheet's names
/// are built into entries only if they make the cut, so thousands of matches cost no more than
/// their ranking.
/// </summary>
public readonly record struct CompletionCandidate(
    string Label, int Match, CompletionGroup Group, int Distance, CompletionEntry? Entry = null, object? Symbol = null);
