namespace CutSheet.Language.Units;

/// <summary>
/// A kind of quantity in the sense of ISO 80000-1: quantities of one dimension can still be
/// of different kinds (torque and energy; rotational frequency and angular velocity; a
/// lead and a length). A kind has a name used in parameter annotations, a dimension
/// (including the soft factors) and, for kinds that share their dimension with another
/// kind, a tag that travels with the value.
/// </summary>
public sealed class Kind
{
    public Kind(string name, Dimension dimension, string description, bool isTagged = false, string? ambiguousWith = null, Kind? basis = null)
    {
        Basis = basis;
        Name = name;
        Dimension = dimension;
        Description = description;
        IsTagged = isTagged;
        AmbiguousWith = ambiguousWith;
    }

    /// <summary>The name written in annotations, e.g. <c>rotational_frequency</c>.</summary>
    public string Name { get; }

    public Dimension Dimension { get; }

    /// <summary>A short phrase for messages and hover, e.g. "rotational frequency (revolutions per time, rpm)".</summary>
    public string Description { get; }

    /// <summary>For a kind declared in a sheet (<c>kind NAME = BASE</c>), the built-in kind it refines; null for built-in kinds.</summary>
    public Kind? Basis { get; }

    /// <summary>True for kinds that cannot be told from their dimension alone (torque, energy).</summary>
    public bool IsTagged { get; }

    /// <summary>For the untagged default of a shared dimension, the kinds it may still become ("torque or energy").</summary>
    public string? AmbiguousWith { get; }

    public override string ToString() => Name;
}
