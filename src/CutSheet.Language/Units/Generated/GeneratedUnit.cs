namespace CutSheet.Language.Units.Generated;

/// <summary>
/// One unit as UnitsNet describes it, restated in coherent SI: one <see cref="Name"/> equals
/// <see cref="Factor"/> SI units plus <see cref="Offset"/> (offsets only for temperature
/// scales). The exponents are UnitsNet's base dimensions of the quantity. Angles are in
/// radians (dimension one, as in SI). Rows of this type are generated; the curated table
/// decides what the language accepts.
/// </summary>
internal sealed record GeneratedUnit(
    string Quantity,
    string Name,
    string[] Abbreviations,
    double Factor,
    double Offset,
    sbyte L, sbyte M, sbyte T, sbyte I, sbyte Th, sbyte N, sbyte J)
{
    public Dimension Dimension => Dimension.FromSi(L, M, T, I, Th, N, J);
}
