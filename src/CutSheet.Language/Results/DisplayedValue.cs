using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;

namespace CutSheet.Language.Results;

/// <summary>
/// A quantity ready to show: the number in <see cref="Unit"/> (<see cref="Number"/>, unrounded),
/// its text rounded to the sheet's significant figures (<see cref="NumberText"/>), and the same
/// value in the other unit system when the sheet shows both. Texts are formatted when first
/// asked for: evaluating a sheet does not pay for display it never shows.
/// </summary>
public sealed class DisplayedValue
{
    private readonly string? _fixedText;
    private readonly string? _alternateUnit;
    private readonly double _alternateNumber;
    private string? _numberText;
    private string? _alternate;

    public DisplayedValue(Quantity quantity, double number, string unit, int digits, string? alternateUnit = null, double alternateNumber = 0, string? fixedText = null)
    {
        Quantity = quantity;
        Number = number;
        Unit = unit;
        Digits = digits;
        _alternateUnit = alternateUnit;
        _alternateNumber = alternateNumber;
        _fixedText = fixedText;
    }

    /// <summary>The value in SI with its dimension and kind.</summary>
    public Quantity Quantity { get; }

    /// <summary>The unrounded number in <see cref="Unit"/> (NaN for values that are not quantities).</summary>
    public double Number { get; }

    /// <summary>The unit as shown ("" for a plain number).</summary>
    public string Unit { get; }

    /// <summary>Significant figures of <see cref="NumberText"/>.</summary>
    public int Digits { get; }

    public string NumberText => _numberText ??= _fixedText ?? NumberFormatter.Format(Number, Digits);

    /// <summary>The value in the other unit system, e.g. <c>2.952 lbf</c>, or null.</summary>
    public string? Alternate => _alternateUnit is null ? null : _alternate ??= Join(NumberFormatter.Format(_alternateNumber, Digits), _alternateUnit);

    /// <summary>Number and unit, e.g. <c>13.13 N</c>; with the alternate in parentheses when set.</summary>
    public string Text => Alternate is null ? Primary : $"{Primary} ({Alternate})";

    /// <summary>The number and unit without the alternate.</summary>
    public string Primary => Join(NumberText, Unit);

    private static string Join(string number, string unit) =>
        unit.Length == 0 ? number : number + (unit is "°" or "%" or "‰" or "′" or "″" ? "" : " ") + unit;

    public override string ToString() => Text;
}
