namespace CutSheet.Language.Units;

/// <summary>The outcome of resolving unit text: a unit, or an error at an offset within the text.</summary>
public sealed record UnitResolution(ResolvedUnit? Unit, UnitError? Error);

/// <summary>Why unit text could not be read; <see cref="Offset"/> and <see cref="Length"/> are within the unit text.</summary>
public sealed record UnitError(string Code, string Message, int Offset, int Length, string? Suggestion = null);
