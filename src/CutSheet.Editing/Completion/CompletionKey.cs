namespace CutSheet.Editing.Completion;

/// <summary>
/// Enough to find a completion's subject again when the editor asks for its details:
/// what it is, its name, and for an imported sheet's member the alias it was reached through.
/// </summary>
public sealed record CompletionKey(CompletionCategory Category, string Name, string? Alias = null);
