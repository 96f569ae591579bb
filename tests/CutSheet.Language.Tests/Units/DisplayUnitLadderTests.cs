using CutSheet.Language.Display;
using CutSheet.Language.Units;

namespace CutSheet.Language.Tests.Units;

/// <summary>
/// The units a sheet's unit system chooses for computed values (<see cref="DisplayUnits.Choose"/>)
/// never have an offset: the evaluator relies on it to warn about arithmetic on °C or °F without
/// choosing every value's display unit first. The rule is the project's own (docs/language.md,
/// display units); no outside value is checked here.
/// </summary>
public class DisplayUnitLadderTests
{
    public static TheoryData<string, UnitSystem> KindsAndSystems()
    {
        var data = new TheoryData<string, UnitSystem>();
        foreach (var kind in Kinds.Builtin)
        {
            foreach (var system in new[] { UnitSystem.Metric, UnitSystem.Inch }) data.Add(kind.Name, system);
        }
        return data;
    }

    [Theory]
    [MemberData(nameof(KindsAndSystems))]
    public void Chosen_units_have_no_offset(string kindName, UnitSystem system)
    {
        var kind = Kinds.Find(kindName)!;
        // Magnitudes across every ladder's steps (N to kN, Pa to MPa, kg·cm² to kg·m²).
        foreach (double si in new[] { 0, 1e-9, 1e-3, 1, 1e3, 1e6, 1e9, -1e3 })
        {
            var unit = DisplayUnits.Choose(si, kind.Dimension, kind.IsTagged ? kind : null, system);
            Assert.False(unit?.HasOffset ?? false, $"{kindName} at {si} in {system}: {unit?.Text} has an offset");
        }
    }
}
