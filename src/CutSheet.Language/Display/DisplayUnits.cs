using System.Collections.Concurrent;
using System.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Display;

/// <summary>
/// The unit a computed value is shown in when nothing else says: per kind and unit system, the
/// largest unit of a short ladder in which the value is at least 1 (1100 N shows as 1.100 kN).
/// A dimension with no named kind shows in SI base units.
/// </summary>
public static class DisplayUnits
{
    private static readonly Dictionary<string, (string[] Metric, string[] Inch)> Ladders = new(StringComparer.Ordinal)
    {
        ["length"] = (["mm"], ["in"]),
        ["mass"] = (["kg"], ["lb"]),
        ["time"] = (["s"], ["s"]),
        ["temperature"] = (["K"], ["K"]),
        ["electric_current"] = (["A"], ["A"]),
        ["area"] = (["mm²"], ["in²"]),
        ["volume"] = (["mm³"], ["in³"]),
        ["velocity"] = (["m/min"], ["ft/min"]),
        ["acceleration"] = (["m/s²"], ["in/s²"]),
        ["force"] = (["N", "kN"], ["lbf"]),
        ["torque"] = (["N·m"], ["lbf·in"]),
        ["torque_or_energy"] = (["N·m"], ["lbf·in"]),
        ["energy"] = (["J", "kJ"], ["ft·lbf"]),
        ["power"] = (["W", "kW"], ["hp"]),
        ["pressure"] = (["Pa", "kPa", "MPa"], ["psi"]),
        ["stiffness"] = (["N/µm"], ["lbf/in"]),
        ["density"] = (["kg/m³"], ["lb/in³"]),
        ["moment_of_inertia"] = (["kg·cm²", "kg·m²"], ["lb·in²"]),
        ["volume_flow_rate"] = (["cm³/min"], ["in³/min"]),
        ["frequency"] = (["Hz"], ["Hz"]),
        ["plane_angle"] = (["°"], ["°"]),
        ["number_of_revolutions"] = (["rev"], ["rev"]),
        ["rotational_frequency"] = (["rpm"], ["rpm"]),
        ["angular_velocity"] = (["rad/s"], ["rad/s"]),
        ["angular_acceleration"] = (["rad/s²"], ["rad/s²"]),
        ["rotational_acceleration"] = (["rev/s²"], ["rev/s²"]),
        ["length_per_revolution"] = (["mm/rev"], ["in/rev"]),
        ["revolutions_per_length"] = (["rev/mm"], ["tpi"]),
        ["number_of_teeth"] = (["tooth"], ["tooth"]),
        ["feed_per_tooth"] = (["mm/tooth"], ["in/tooth"]),
        ["number_of_starts"] = (["start"], ["start"]),
        ["number_of_cycles"] = (["cycle"], ["cycle"]),
        ["number_of_divisions"] = (["div"], ["div"]),
        ["length_per_division"] = (["mm/div"], ["in/div"]),
        ["number_of_strokes"] = (["stroke"], ["stroke"]),
        ["torsional_stiffness"] = (["N·m/rad"], ["lbf·in/rad"]),
    };

    private static readonly HashSet<string> InchSymbols = new(StringComparer.Ordinal)
    {
        "in", "inch", "inches", "ft", "foot", "feet", "yd", "mi", "thou", "mil", "tenth", "tenths", "lb", "lbm", "lbf", "oz", "ozf", "kip", "slug",
        "psi", "ksi", "hp", "sfm", "sfpm", "fpm", "ipm", "ipr", "ipt", "tpi", "gal", "Btu", "BTU",
    };

    /// <summary>True when unit text is written with inch-system symbols (in, lbf, psi, hp, sfm…).</summary>
    public static bool IsInchUnit(string unitText)
    {
        int i = 0;
        while (i < unitText.Length)
        {
            if (!char.IsLetter(unitText[i])) { i++; continue; }
            int start = i;
            while (i < unitText.Length && (char.IsLetter(unitText[i]) || unitText[i] == '_')) i++;
            if (InchSymbols.Contains(unitText[start..i])) return true;
        }
        return false;
    }

    /// <summary>
    /// The candidate units of each (dimension, kind name, inch or not) seen so far: the kind's ladder
    /// resolved, or the SI unit alone when the kind has none. Every value of a sheet is shown, so
    /// inferring the kind, finding its ladder and resolving its units once per combination instead
    /// of once per value matters; the entries are immutable, so the cache is shared by all threads.
    /// </summary>
    private static readonly ConcurrentDictionary<(Dimension Dimension, string? Kind, bool Inch), ResolvedUnit[]> Candidates = new();

    /// <summary>The unit to show a quantity in, or null for a plain number.</summary>
    public static ResolvedUnit? Choose(double si, Dimension dimension, Kind? tag, UnitSystem system)
    {
        if (dimension.IsNone) return null;
        var key = (dimension, tag?.Name, system == UnitSystem.Inch);
        if (!Candidates.TryGetValue(key, out var units))
        {
            units = CandidatesFor(dimension, tag, system);
            // Kind names come from sheets too; stop remembering rather than grow without bound.
            if (Candidates.Count < 10_000) Candidates[key] = units;
        }
        // The largest unit of the ladder in which the value is at least 1, else the first.
        var best = units[0];
        for (int i = 1; i < units.Length; i++)
        {
            if (Math.Abs(si) / units[i].Factor >= 1) best = units[i];
        }
        return best;
    }

    private static ResolvedUnit[] CandidatesFor(Dimension dimension, Kind? tag, UnitSystem system)
    {
        // Counts and angles left over in a product (π·D·n is an angle times a length per time) are dimension
        // one: show the kind without them.
        var kind = tag ?? Kinds.Infer(dimension) ?? Kinds.Infer(WithoutCounts(dimension)) ?? Kinds.Infer(dimension.Si);
        if (kind is not null && Ladders.TryGetValue(kind.Name, out var ladder))
        {
            var texts = system == UnitSystem.Inch ? ladder.Inch : ladder.Metric;
            var units = new List<ResolvedUnit>(texts.Length);
            foreach (var text in texts)
            {
                if (UnitCatalog.Default.Resolve(text).Unit is { } unit) units.Add(unit);
            }
            if (units.Count > 0) return units.ToArray();
        }
        return [SiUnit(dimension)];
    }

    private static Dimension WithoutCounts(Dimension d)
    {
        var result = d.Si;
        if (d[Dimension.Angle] != 0) result *= Dimension.Of(Dimension.Angle, d[Dimension.Angle]);
        return result;
    }

    /// <summary>The coherent SI unit of a dimension, written with base symbols (e.g. <c>kg·m²/s³</c>).</summary>
    public static ResolvedUnit SiUnit(Dimension dimension)
    {
        string[] symbols = ["m", "kg", "s", "A", "K", "mol", "cd", "rad", "rev", "tooth", "start", "cycle", "div", "stroke"];
        var num = new StringBuilder();
        var den = new StringBuilder();
        for (int k = 0; k < Dimension.Count; k++)
        {
            int e = dimension[k];
            if (e == 0) continue;
            var target = e > 0 ? num : den;
            if (target.Length > 0) target.Append('·');
            target.Append(symbols[k]);
            if (Math.Abs(e) != 1) target.Append(Superscript.Of(Math.Abs(e)));
        }
        string text = num.Length == 0 ? (den.Length == 0 ? "1" : "1/" + Paren(den.ToString())) : den.Length == 0 ? num.ToString() : num + "/" + Paren(den.ToString());
        return new ResolvedUnit(text, 1, 0, dimension, null, []);
    }

    private static string Paren(string s) => s.Contains('·') ? "(" + s + ")" : s;
}
