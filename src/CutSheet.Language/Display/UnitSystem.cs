namespace CutSheet.Language.Display;

/// <summary>Which units computed values are shown in when no <c>as</c> says otherwise.</summary>
public enum UnitSystem
{
    Metric,
    Inch,
    /// <summary>Metric first, the inch value in parentheses.</summary>
    Both,
}
