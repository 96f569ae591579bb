using System.Globalization;
using System.Reflection;
using System.Text;
using UnitsNet;

namespace CutSheet.UnitCatalogGenerator;

/// <summary>The generated file's text plus what was left out, for stderr and for tests.</summary>
public sealed record GenerationResult(string Text, int Rows, IReadOnlyList<string> SkippedUnits);

/// <summary>
/// Restates every UnitsNet unit as "one unit = Factor·(coherent SI) + Offset" and renders
/// src/CutSheet.Language/Units/Generated/UnitsNetTable.g.cs. Pure: no file access here, so the
/// freshness test can call it in-process.
/// </summary>
public static class UnitTableGenerator
{
    public const string OutputPath = "src/CutSheet.Language/Units/Generated/UnitsNetTable.g.cs";

    private static readonly CultureInfo EnUs = CultureInfo.GetCultureInfo("en-US");

    public static GenerationResult Generate()
    {
        string version = UnitsNetVersion();
        if (version != SiPolicy.ReviewedVersion)
            throw new InvalidOperationException(
                $"UnitsNet {version} is loaded but SiPolicy was reviewed for {SiPolicy.ReviewedVersion}: review base units, then bump.");

        var rows = new StringBuilder();
        var skipped = new List<string>();
        int count = 0;
        foreach (var q in Quantity.Infos.OrderBy(q => q.Name, StringComparer.Ordinal))
        {
            if (SiPolicy.Excluded.ContainsKey(q.Name)) continue;
            double siFactor = SiFactorOfBase(q);
            var d = q.BaseDimensions;
            foreach (var u in q.UnitInfos.OrderBy(u => u.Name, StringComparer.Ordinal))
            {
                if (!TryAffine(u.Value, q.BaseUnitInfo.Value, out double factor, out double offset))
                {
                    skipped.Add($"{q.Name}.{u.Name}");
                    continue;
                }
                rows.Append("        new(").Append(Str(q.Name)).Append(", ").Append(Str(u.Name)).Append(", [")
                    .Append(string.Join(", ", Abbreviations(u.Value).Select(Str))).Append("], ")
                    .Append(Num(factor * siFactor)).Append(", ").Append(Num(offset * siFactor + 0.0)).Append(", ")
                    .Append(string.Join(", ", new[] { d.Length, d.Mass, d.Time, d.Current, d.Temperature, d.Amount, d.LuminousIntensity }))
                    .Append("),\n");
                count++;
            }
        }
        return new GenerationResult(Header(version) + rows + "    ];\n}\n", count, skipped);
    }

    /// <summary>
    /// Offset = value at 0; factor = value(1) − value(0) when the offset is 0 (exact: one
    /// multiplication). For offset units that subtraction of two ~255 K numbers loses digits
    /// (°F gave 0.5555555555555429, m°C 0.0009999999999763531), so the slope is read at v = 2⁸⁰:
    /// there the offset is far below half an ulp and, v being a power of two, value/v is
    /// UnitsNet's own factor correctly rounded (°F → 0.5555555555555556, m°C → 0.001). A third
    /// point (10) must fit the line, which drops non-affine rows (Angle.Tilt is sin θ,
    /// Frequency.BUnit a square root, the barometric Pressure.*OfElevation); UnitsNet throws on
    /// others (NaN/∞).
    /// </summary>
    private static bool TryAffine(Enum unit, Enum baseUnit, out double factor, out double offset)
    {
        factor = offset = double.NaN;
        try
        {
            double At(double v) => Quantity.From(v, unit).As(baseUnit);
            offset = At(0);
            const double huge = 1208925819614629174706176.0;   // 2⁸⁰
            factor = offset == 0 ? At(1) : At(huge) / huge;
            double at10 = At(10), predicted = offset + 10 * factor;
            return double.IsFinite(factor) && double.IsFinite(offset) && factor != 0
                && Math.Abs(at10 - predicted) <= 1e-9 * Math.Max(Math.Abs(at10), Math.Abs(offset));
        }
        catch (Exception)
        {
            return false;
        }
    }

    private static double SiFactorOfBase(QuantityInfo q)
    {
        if (!SiPolicy.NonCoherentBase.TryGetValue(q.Name, out var entry)) return 1;
        if (entry.BaseUnit != q.BaseUnitInfo.Name)
            throw new InvalidOperationException($"{q.Name}: base unit is {q.BaseUnitInfo.Name}, SiPolicy expects {entry.BaseUnit}.");
        return entry.SiFactor;
    }

    /// <summary>All en-US abbreviations, in UnitsNet's order, first occurrence kept.</summary>
    private static IEnumerable<string> Abbreviations(Enum unit)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        foreach (var a in UnitsNetSetup.Default.UnitAbbreviations.GetUnitAbbreviations(unit.GetType(), Convert.ToInt32(unit, CultureInfo.InvariantCulture), EnUs))
            if (seen.Add(a)) yield return a;
    }

    public static string UnitsNetVersion()
    {
        string info = typeof(Length).Assembly.GetCustomAttribute<AssemblyInformationalVersionAttribute>()?.InformationalVersion ?? "?";
        return info.Split('+')[0];   // drop the "+commit" suffix
    }

    /// <summary>Shortest round-trip form. Callers add +0.0 where −0 could appear (it prints "-0").</summary>
    private static string Num(double x) => x.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>C# regular string literal: escape quotes, backslashes, control and line-break
    /// characters (U+0085, U+2028/9 end a line in C#); other Unicode stays readable.</summary>
    public static string Str(string s)
    {
        var b = new StringBuilder("\"");
        foreach (char c in s)
        {
            switch (c)
            {
                case '"': b.Append("\\\""); break;
                case '\\': b.Append("\\\\"); break;
                case '\n': b.Append("\\n"); break;
                case '\r': b.Append("\\r"); break;
                case '\t': b.Append("\\t"); break;
                default:
                    if (char.IsControl(c) || c is '\u2028' or '\u2029')   // IsControl covers U+0085
                        b.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
                    else
                        b.Append(c);
                    break;
            }
        }
        return b.Append('"').ToString();
    }

    private static string Header(string version) =>
        "// <auto-generated>\n" +
        $"// Generated by tools/CutSheet.UnitCatalogGenerator from UnitsNet {version} metadata (quantities, units,\n" +
        "// en-US abbreviations, conversion factors). Do not edit: run\n" +
        "//   dotnet run --project tools/CutSheet.UnitCatalogGenerator\n" +
        "// UnitsNet is the source of truth for these rows; src/CutSheet.Language/Units/CuratedUnits.cs decides what the language accepts.\n" +
        "// </auto-generated>\n" +
        "namespace CutSheet.Language.Units.Generated;\n" +
        "\n" +
        "internal static class UnitsNetTable\n" +
        "{\n" +
        $"    public const string UnitsNetVersion = \"{version}\";\n" +
        "    public static readonly GeneratedUnit[] Units =\n" +
        "    [\n";
}
