namespace CutSheet.Language.Units;

/// <summary>
/// A unit expression as written after a number or after <c>as</c> (<c>N·m</c>, <c>mm/rev</c>,
/// <c>kg/(m·s)</c>), resolved to a factor, dimension and kind. <see cref="Notes"/> carries the
/// information notes of shop spellings read in a particular way.
/// </summary>
public sealed record ResolvedUnit(
    string Text,
    double Factor,
    double Offset,
    Dimension Dimension,
    Kind? Tag,
    IReadOnlyList<string> Notes)
{
    public bool HasOffset => Offset != 0;

    /// <summary>The SI value of <paramref name="value"/> in this unit.</summary>
    public double ToSi(double value) => value * Factor + Offset;

    /// <summary>The value in this unit of an SI value.</summary>
    public double FromSi(double si) => (si - Offset) / Factor;
}
