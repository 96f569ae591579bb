namespace CutSheet.Editing.Hints;

/// <summary>A label shown in the text at <see cref="Offset"/>: a computed value or a check's outcome.</summary>
public sealed record ValueHint(int Offset, string Label, ValueHintCategory Category, int Line);

public enum ValueHintCategory { Value, Check }
