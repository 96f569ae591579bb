using static CutSheet.Language.Units.Dimension;

namespace CutSheet.Language.Units;

/// <summary>
/// The built-in kinds (ISO 80000 quantity names plus the counted entities of ISO 80000-1 that
/// the trade writes: revolutions, teeth, starts, cycles, dial divisions, strokes) and the
/// inference of a kind from a dimension. See docs/language.md, "Kinds".
/// </summary>
public static class Kinds
{
    private static readonly Dimension L = Dimension.FromSi(1, 0, 0), M = Dimension.FromSi(0, 1, 0), T = Dimension.FromSi(0, 0, 1);
    private static readonly Dimension Rad = Dimension.Of(Angle), RevD = Dimension.Of(Rev);
    private static readonly Dimension ForceD = M * L / (T * T);
    private static readonly Dimension EnergyD = ForceD * L;

    public static readonly Kind Ratio = new("ratio", None, "a number (dimension one)");
    public static readonly Kind Length = new("length", L, "length");
    public static readonly Kind Mass = new("mass", M, "mass");
    public static readonly Kind Time = new("time", T, "time (duration)");
    public static readonly Kind Temperature = new("temperature", Dimension.Of(Dimension.Temperature), "thermodynamic temperature");
    public static readonly Kind Current = new("electric_current", Dimension.Of(Dimension.Current), "electric current");
    public static readonly Kind Area = new("area", L * L, "area");
    public static readonly Kind Volume = new("volume", L * L * L, "volume");
    public static readonly Kind Velocity = new("velocity", L / T, "velocity (speed)");
    public static readonly Kind Acceleration = new("acceleration", L / (T * T), "acceleration");
    public static readonly Kind Force = new("force", ForceD, "force");
    public static readonly Kind Torque = new("torque", EnergyD, "torque (moment of force)", isTagged: true);
    public static readonly Kind Energy = new("energy", EnergyD, "energy (work)", isTagged: true);
    public static readonly Kind TorqueOrEnergy = new("torque_or_energy", EnergyD, "force × length (torque or energy — not yet settled)", ambiguousWith: "torque or energy");
    public static readonly Kind Power = new("power", EnergyD / T, "power");
    public static readonly Kind Pressure = new("pressure", ForceD / (L * L), "pressure (stress, specific cutting force, specific energy)");
    public static readonly Kind Stiffness = new("stiffness", ForceD / L, "force per length (stiffness)");
    public static readonly Kind Density = new("density", M / (L * L * L), "mass density");
    public static readonly Kind MomentOfInertia = new("moment_of_inertia", M * L * L, "moment of inertia");
    public static readonly Kind VolumeFlowRate = new("volume_flow_rate", L * L * L / T, "volume per time (removal rate)");
    public static readonly Kind Frequency = new("frequency", None / T, "frequency (per time)");
    public static readonly Kind PlaneAngle = new("plane_angle", Rad, "plane angle");
    public static readonly Kind NumberOfRevolutions = new("number_of_revolutions", RevD, "number of revolutions");
    public static readonly Kind RotationalFrequency = new("rotational_frequency", RevD / T, "rotational frequency (revolutions per time, rpm)");
    public static readonly Kind AngularVelocity = new("angular_velocity", Rad / T, "angular velocity (angle per time, rad/s)");
    public static readonly Kind AngularAcceleration = new("angular_acceleration", Rad / (T * T), "angular acceleration (rad/s²)");
    public static readonly Kind RotationalAcceleration = new("rotational_acceleration", RevD / (T * T), "rotational acceleration (revolutions per time squared)");
    public static readonly Kind LengthPerRevolution = new("length_per_revolution", L / RevD, "length per revolution (lead, feed per revolution)");
    public static readonly Kind RevolutionsPerLength = new("revolutions_per_length", RevD / L, "revolutions per length (threads per inch)");
    public static readonly Kind NumberOfTeeth = new("number_of_teeth", Dimension.Of(Tooth), "number of teeth");
    public static readonly Kind FeedPerTooth = new("feed_per_tooth", L / Dimension.Of(Tooth), "length per tooth (feed per tooth)");
    public static readonly Kind NumberOfStarts = new("number_of_starts", Dimension.Of(Start), "number of thread starts");
    public static readonly Kind NumberOfCycles = new("number_of_cycles", Dimension.Of(Cycle), "number of cycles");
    public static readonly Kind NumberOfDivisions = new("number_of_divisions", Dimension.Of(Division), "number of dial divisions");
    public static readonly Kind LengthPerDivision = new("length_per_division", L / Dimension.Of(Division), "length per dial division");
    public static readonly Kind NumberOfStrokes = new("number_of_strokes", Dimension.Of(Stroke), "number of strokes");
    public static readonly Kind TorquePerAngle = new("torsional_stiffness", EnergyD / Rad, "torque per angle (torsional stiffness)");

    private static readonly Kind[] All =
    [
        Ratio, Length, Mass, Time, Temperature, Current, Area, Volume, Velocity, Acceleration, Force, Torque, Energy,
        TorqueOrEnergy, Power, Pressure, Stiffness, Density, MomentOfInertia, VolumeFlowRate, Frequency, PlaneAngle,
        NumberOfRevolutions, RotationalFrequency, AngularVelocity, AngularAcceleration, RotationalAcceleration,
        LengthPerRevolution, RevolutionsPerLength, NumberOfTeeth, FeedPerTooth, NumberOfStarts, NumberOfCycles,
        NumberOfDivisions, LengthPerDivision, NumberOfStrokes, TorquePerAngle,
    ];

    private static readonly Dictionary<string, Kind> ByName = BuildByName();
    private static readonly Dictionary<Dimension, Kind> ByDimension = BuildByDimension();

    /// <summary>Every built-in kind, in documentation order.</summary>
    public static IReadOnlyList<Kind> Builtin => All;

    /// <summary>Names accepted in annotations besides the kinds' own names.</summary>
    public static IReadOnlyDictionary<string, Kind> Aliases { get; } = new Dictionary<string, Kind>(StringComparer.Ordinal)
    {
        ["number"] = Ratio,
        ["dimensionless"] = Ratio,
        ["speed"] = Velocity,
        ["angle"] = PlaneAngle,
        ["stress"] = Pressure,
        ["work"] = Energy,
        ["moment_of_force"] = Torque,
        ["lead"] = LengthPerRevolution,
        ["feed_per_revolution"] = LengthPerRevolution,
    };

    public static Kind? Find(string name) =>
        ByName.TryGetValue(name, out var k) ? k : Aliases.TryGetValue(name, out var a) ? a : null;

    /// <summary>The kind a value of this dimension has when nothing has settled it; null when no kind is named for it.</summary>
    public static Kind? Infer(Dimension dimension) => ByDimension.TryGetValue(dimension, out var k) ? k : null;

    /// <summary>A phrase for a dimension: the inferred kind's name, else "no named kind".</summary>
    public static string Describe(Dimension dimension, Kind? tag = null)
    {
        var kind = tag ?? Infer(dimension);
        return kind is null ? "no named kind" : kind.Name.Replace('_', ' ');
    }

    private static Dictionary<string, Kind> BuildByName()
    {
        var d = new Dictionary<string, Kind>(StringComparer.Ordinal);
        foreach (var k in All) d[k.Name] = k;
        return d;
    }

    private static Dictionary<Dimension, Kind> BuildByDimension()
    {
        var d = new Dictionary<Dimension, Kind>();
        foreach (var k in All)
        {
            if (k.IsTagged) continue;
            d.TryAdd(k.Dimension, k);
        }
        return d;
    }
}
