namespace CutSheet.Editing.Completion;

/// <summary>Completions at a place; <see cref="IsIncomplete"/> when the list was cut and typing more should ask again.</summary>
public sealed record CompletionResult(IReadOnlyList<CompletionEntry> Items, bool IsIncomplete)
{
    public static readonly CompletionResult Empty = new([], false);
}
