using CutSheet.Language.Evaluation;

namespace CutSheet.Language.Results;

/// <summary>
/// A quantity ready to show: the number in <see cref="Unit"/> rounded to the sheet's
/// significant figures (<see cref="Text"/>), the unrounded number (<see cref="Number"/>),
/// and the same value in the other unit system when the sheet shows both.
/// </summary>
public sealed record DisplayedValue(Quantity Quantity, double Number, string Unit, string NumberText, string? Alternate)
{
    /// <summary>Number and unit, e.g. <c>13.13 N</c>; with the alternate in parentheses when set.</summary>
    public string Text => (Unit.Length == 0 ? NumberText : NumberText + (Unit is "°" or "%" or "‰" ? "" : " ") + Unit) + (Alternate is null ? "" : $" ({Alternate})");

    /// <summary>The number and unit without the alternate.</summary>
    public string Primary => Unit.Length == 0 ? NumberText : NumberText + (Unit is "°" or "%" or "‰" ? "" : " ") + Unit;
}
