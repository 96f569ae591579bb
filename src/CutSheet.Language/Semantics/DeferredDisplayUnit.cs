using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Units;

namespace CutSheet.Language.Semantics;

/// <summary>
/// A display unit not chosen yet: that of a computed value, taken from the unit system's ladder
/// for its kind (<see cref="DisplayUnits.Choose"/>) when first asked for. Most values are never
/// shown one by one, so a sheet need not choose for each as it evaluates. Ladder units and SI
/// units have no offset, which lets the offset warning ask without choosing.
/// </summary>
internal sealed class DeferredDisplayUnit
{
    public static readonly DeferredDisplayUnit Metric = new(UnitSystem.Metric);
    public static readonly DeferredDisplayUnit Inch = new(UnitSystem.Inch);

    private readonly UnitSystem _system;

    private DeferredDisplayUnit(UnitSystem system) => _system = system;

    public static DeferredDisplayUnit For(UnitSystem system) => system == UnitSystem.Inch ? Inch : Metric;

    /// <summary>The unit, or null when the chosen one does not fit the value (as an eager choice would have left it).</summary>
    public ResolvedUnit? Choose(Quantity q)
    {
        var unit = DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, _system);
        return unit is not null && unit.Dimension.SiEquals(q.Dimension) ? unit : null;
    }
}
