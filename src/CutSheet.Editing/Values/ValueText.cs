using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;

namespace CutSheet.Editing.Values;

/// <summary>
/// Value texts for editor features: a value as the sheet shows it, and the same value in the
/// other unit system (a reader checking a metric sheet against an inch drawing wants both).
/// </summary>
public static class ValueText
{
    /// <summary>The value as shown, then the other unit system in parentheses when it differs.</summary>
    public static string Both(DisplayedValue value)
    {
        string? other = value.Alternate ?? OtherSystem(value.Quantity, value.Unit, value.Digits);
        return other is null ? value.Primary : $"{value.Primary} ({other})";
    }

    /// <summary>A definition of another sheet (known only through the language's symbol), as that sheet shows it.</summary>
    public static string? Of(DefinitionSymbol symbol, int digits)
    {
        var value = symbol.Value;
        switch (value.Kind)
        {
            case ValueKind.Boolean: return value.Boolean ? "true" : "false";
            case ValueKind.Choice: return value.Choice!.Name;
            case ValueKind.Quantity:
                var q = value.Quantity;
                var unit = symbol.DisplayUnit ?? DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, UnitSystem.Metric);
                if (unit is null) return NumberFormatter.Format(q.Si, digits);
                return Join(NumberFormatter.Format(unit.FromSi(q.Si), digits), unit.Text);
            default: return null;
        }
    }

    /// <summary>The quantity in the unit system it is not shown in, or null (plain numbers, lists, same unit).</summary>
    public static string? OtherSystem(Quantity quantity, string shownUnit, int digits)
    {
        if (double.IsNaN(quantity.Si) || quantity.Dimension.IsNone) return null;
        var system = DisplayUnits.IsInchUnit(shownUnit) ? UnitSystem.Metric : UnitSystem.Inch;
        var unit = DisplayUnits.Choose(quantity.Si, quantity.Dimension, quantity.Tag, system);
        // Only a change of system is worth showing: angles, times and plain counts read the same in both.
        if (unit is null || unit.Text == shownUnit || DisplayUnits.IsInchUnit(unit.Text) == DisplayUnits.IsInchUnit(shownUnit)) return null;
        return Join(NumberFormatter.Format(unit.FromSi(quantity.Si), digits), unit.Text);
    }

    private static string Join(string number, string unit) =>
        unit.Length == 0 ? number : number + (unit is "°" or "%" or "‰" or "′" or "″" ? "" : " ") + unit;
}
