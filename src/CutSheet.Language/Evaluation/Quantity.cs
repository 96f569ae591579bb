using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>A value in coherent SI units (angles in radians, counts as 1) with its dimension and, where needed, its kind tag.</summary>
public readonly record struct Quantity(double Si, Dimension Dimension, Kind? Tag = null)
{
    /// <summary>The kind: the tag when set, else the kind inferred from the dimension (null when none is named).</summary>
    public Kind? Kind => Tag ?? Kinds.Infer(Dimension);
}
