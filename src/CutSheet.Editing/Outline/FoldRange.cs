namespace CutSheet.Editing.Outline;

/// <summary>Lines (zero-based, inclusive) that fold together: a section, or a statement written over several lines.</summary>
public sealed record FoldRange(int StartLine, int EndLine, bool IsSection);
