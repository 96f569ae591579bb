using CutSheet.Language.Display;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Chooses the unit a value is shown in and formats it. The rule, in order: the unit after
/// <c>as</c>; the unit of a lone literal as written; the unit of a lone name's definition; the
/// sheet's unit system by kind. Display never changes the stored value.
/// </summary>
internal sealed class ValuePresenter(DisplaySettings settings, SheetScope scope)
{
    public ResolvedUnit? UnitFor(ExpressionSyntax root, Quantity q) =>
        TryNamedUnit(root, q, out var unit) ? unit : DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, ChoiceSystem);

    /// <summary>The unit system the ladders are read in when the expression names no unit (both shows metric first).</summary>
    public UnitSystem ChoiceSystem => settings.Units == UnitSystem.Inch ? UnitSystem.Inch : UnitSystem.Metric;

    /// <summary>
    /// The first three rules: true when the expression itself settles the unit (after <c>as</c>, a
    /// literal as written, a lone name shown in a unit); false when the unit system must choose.
    /// </summary>
    public bool TryNamedUnit(ExpressionSyntax root, Quantity q, out ResolvedUnit? unit)
    {
        switch (root)
        {
            case ConvertSyntax c:
                unit = UnitFacts.Of(c.Unit).Resolution.Unit;
                return true;
            case QuantityLiteralSyntax { Unit: { } u }:
                unit = UnitFacts.Of(u).Resolution.Unit;
                return true;
            case UnarySyntax { Operator: UnaryOperator.Negate, Operand: QuantityLiteralSyntax { Unit: { } nu } }:
                unit = UnitFacts.Of(nu).Resolution.Unit;
                return true;
            case QuantityLiteralSyntax:
                unit = null;
                return true;
            case NameSyntax n when scope.Find(n.Name) is DefinitionSymbol { DisplayUnit: { } du } && du.Dimension.SiEquals(q.Dimension):
                unit = du;
                return true;
        }
        unit = null;
        return false;
    }

    public DisplayedValue Present(Quantity q, ResolvedUnit? unit, int? digits = null)
    {
        int d = digits ?? settings.Digits;
        double number = unit is null ? q.Si : ConvertForDisplay(q, unit);
        if (settings.Units == UnitSystem.Both && unit is not null)
        {
            // The other system: inch beside a metric unit, metric beside an inch unit.
            var other = DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, DisplayUnits.IsInchUnit(unit.Text) ? UnitSystem.Metric : UnitSystem.Inch);
            bool sameInBoth = DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, UnitSystem.Metric)?.Text == DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, UnitSystem.Inch)?.Text;
            if (other is not null && other.Text != unit.Text && !sameInBoth)
                return new DisplayedValue(q, number, unit.Text, d, other.Text, ConvertForDisplay(q, other));
        }
        return new DisplayedValue(q, number, unit?.Text ?? "", d);
    }

    public DisplayedValue PresentOther(Value v) => v.Kind switch
    {
        ValueKind.Boolean => new DisplayedValue(default, double.NaN, "", settings.Digits, fixedText: v.Boolean ? "true" : "false"),
        ValueKind.Choice => new DisplayedValue(default, double.NaN, "", settings.Digits, fixedText: v.Choice!.Name),
        _ => new DisplayedValue(default, double.NaN, "", settings.Digits, fixedText: "unknown"),
    };

    public DisplayedValue PresentList(QuantityList list, ResolvedUnit? unit)
    {
        var items = list.Values.Take(20).Select(x => NumberFormatter.Format(unit is null ? x : ConvertForDisplay(new Quantity(x, list.Dimension), unit), settings.Digits));
        string text = "[" + string.Join(", ", items) + (list.Values.Length > 20 ? ", …" : "") + "]";
        return new DisplayedValue(new Quantity(double.NaN, list.Dimension, list.Tag), double.NaN, unit?.Text ?? "", settings.Digits, fixedText: text);
    }

    /// <summary>The number in a unit; revolutions and radians are bridged by 2π as in <c>as</c>.</summary>
    public static double ConvertForDisplay(Quantity q, ResolvedUnit unit)
    {
        var from = q.Dimension;
        var to = unit.Dimension;
        double si = q.Si;
        int a = from[Dimension.Angle], b = from[Dimension.Rev], c = to[Dimension.Angle], d = to[Dimension.Rev];
        if ((a != c || b != d) && a + b == c + d) si *= Math.Pow(2 * Math.PI, b - d);
        return unit.FromSi(si);
    }
}
