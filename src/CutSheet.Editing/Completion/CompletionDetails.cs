namespace CutSheet.Editing.Completion;

/// <summary>What a completion shows once selected: a one-line detail (a value, a signature) and longer documentation.</summary>
public sealed record CompletionDetails(string? Detail, string? Documentation);
