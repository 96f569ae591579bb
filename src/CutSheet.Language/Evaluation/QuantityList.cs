using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>A list of quantities of one dimension (a load spectrum, a duty cycle), values in SI.</summary>
public sealed record QuantityList(double[] Values, Dimension Dimension, Kind? Tag)
{
    public const int MaxLength = 10_000;
}
