namespace CutSheet.Language.Display;

/// <summary>How values are shown: the unit system and the significant figures (default 4).</summary>
public sealed record DisplaySettings(UnitSystem Units = UnitSystem.Metric, int Digits = 4)
{
    public static readonly DisplaySettings Default = new();
}
