namespace CutSheet.Language.Units;

/// <summary>A symbol UnitsNet gives to several units, the unit chosen and why.</summary>
public sealed record UnitCollision(string Symbol, IReadOnlyList<string> Candidates, string Chosen, string Why);
