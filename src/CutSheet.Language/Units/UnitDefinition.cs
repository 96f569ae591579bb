namespace CutSheet.Language.Units;

/// <summary>
/// One accepted unit symbol: one <see cref="Symbol"/> equals <see cref="Factor"/> coherent SI
/// units (angles in radians, counted entities as 1) plus <see cref="Offset"/> (temperature
/// scales only). <see cref="Origin"/> says where the row comes from (a UnitsNet unit or the
/// curated table) and <see cref="Note"/>, when set, is the information note shown where the
/// symbol is read in a way the user may not expect.
/// </summary>
public sealed record UnitDefinition(
    string Symbol,
    string Name,
    double Factor,
    double Offset,
    Dimension Dimension,
    Kind? Tag,
    string Origin,
    string? Note = null);
