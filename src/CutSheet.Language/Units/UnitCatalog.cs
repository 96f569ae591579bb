using System.Collections.Concurrent;
using CutSheet.Language.Units.Generated;

namespace CutSheet.Language.Units;

/// <summary>
/// The symbols the language accepts: UnitsNet's units (generated at build time into
/// <see cref="UnitsNetTable"/>) adjusted and extended by <see cref="CuratedUnits"/>. Resolves
/// unit expressions such as <c>N·m</c>, <c>mm/rev</c> or <c>kg/(m·s²)</c>; resolutions are cached.
/// </summary>
public sealed class UnitCatalog
{
    private static readonly Lazy<UnitCatalog> LazyDefault = new(() => new UnitCatalog());

    private readonly Dictionary<string, UnitDefinition> _symbols = new(StringComparer.Ordinal);
    private readonly List<UnitCollision> _collisions = [];
    private readonly ConcurrentDictionary<string, UnitResolution> _cache = new(StringComparer.Ordinal);

    /// <summary>The catalog every sheet uses.</summary>
    public static UnitCatalog Default => LazyDefault.Value;

    /// <summary>The UnitsNet version the generated rows came from.</summary>
    public static string UnitsNetVersion => UnitsNetTable.UnitsNetVersion;

    private UnitCatalog()
    {
        AddGenerated();
        AddCurated();
    }

    /// <summary>Every accepted symbol.</summary>
    public IReadOnlyCollection<UnitDefinition> Symbols => _symbols.Values;

    /// <summary>Symbols that UnitsNet gives to more than one unit, and the choice made.</summary>
    public IReadOnlyList<UnitCollision> Collisions => _collisions;

    public bool IsSymbol(string text) => _symbols.ContainsKey(UnitText.Normalize(text));

    public UnitDefinition? FindSymbol(string symbol) => _symbols.GetValueOrDefault(UnitText.Normalize(symbol));

    /// <summary>Resolves a unit expression; never throws.</summary>
    public UnitResolution Resolve(string text)
    {
        if (_cache.TryGetValue(text, out var cached)) return cached;
        var result = UnitExpressionParser.Parse(text, this);
        if (_cache.Count < 100_000) _cache[text] = result;
        return result;
    }

    internal UnitDefinition? Lookup(string normalizedSymbol) => _symbols.GetValueOrDefault(normalizedSymbol);

    private void AddGenerated()
    {
        var candidates = new Dictionary<string, List<(GeneratedUnit Row, UnitDefinition Def)>>(StringComparer.Ordinal);
        foreach (var row in UnitsNetTable.Units)
        {
            if (CuratedUnits.ExcludedQuantities.ContainsKey(row.Quantity)) continue;
            if (CuratedUnits.ExcludedQuantities.ContainsKey(row.Quantity + "." + row.Name)) continue;
            var (factor, dimension, tag) = Adapt(row);
            foreach (var raw in row.Abbreviations)
            {
                string symbol = UnitText.Normalize(raw);
                if (symbol.Length == 0 || symbol.Contains(' ') || CuratedUnits.ExcludedSymbols.ContainsKey(symbol)) continue;
                var def = new UnitDefinition(symbol, Humanize(row.Name), factor, row.Offset, dimension, tag, $"UnitsNet {row.Quantity}.{row.Name}");
                if (!candidates.TryGetValue(symbol, out var list)) candidates[symbol] = list = [];
                if (!list.Exists(c => c.Row.Quantity == row.Quantity && c.Row.Name == row.Name)) list.Add((row, def));
            }
        }

        foreach (var (symbol, list) in candidates)
        {
            var chosen = Choose(symbol, list, out string why);
            _symbols[symbol] = chosen.Def;
            if (list.Count > 1)
            {
                _collisions.Add(new UnitCollision(symbol, list.Select(c => $"{c.Row.Quantity}.{c.Row.Name}").ToArray(),
                    $"{chosen.Row.Quantity}.{chosen.Row.Name}", why));
            }
        }
        _collisions.Sort((a, b) => string.CompareOrdinal(a.Symbol, b.Symbol));
    }

    private static (GeneratedUnit Row, UnitDefinition Def) Choose(string symbol, List<(GeneratedUnit Row, UnitDefinition Def)> list, out string why)
    {
        if (list.Count == 1) { why = ""; return list[0]; }
        if (CuratedUnits.Choices.TryGetValue(symbol, out var choice))
        {
            var match = list.FindIndex(c => $"{c.Row.Quantity}.{c.Row.Name}" == choice.Unit);
            if (match >= 0) { why = choice.Why; return list[match]; }
        }
        int Rank(GeneratedUnit r)
        {
            int i = Array.IndexOf(CuratedUnits.QuantityPriority, r.Quantity);
            return i < 0 ? int.MaxValue : i;
        }
        var best = list.OrderBy(c => Rank(c.Row)).ThenBy(c => c.Row.Quantity, StringComparer.Ordinal).ThenBy(c => c.Row.Name, StringComparer.Ordinal).First();
        why = Rank(best.Row) == int.MaxValue ? "first quantity in alphabetical order" : $"{best.Row.Quantity} comes first in the quantity priority list";
        return best;
    }

    /// <summary>Applies the rotation and kind rules to a UnitsNet row.</summary>
    private static (double Factor, Dimension Dimension, Kind? Tag) Adapt(GeneratedUnit row)
    {
        double factor = CuratedUnits.FactorOverrides.TryGetValue($"{row.Quantity}.{row.Name}", out var exact) ? exact : row.Factor;
        var dim = row.Dimension;
        Kind? tag = null;
        switch (row.Quantity)
        {
            case "Angle":
                dim *= Dimension.Of(Dimension.Angle);
                break;
            case "RotationalSpeed":
            case "RotationalAcceleration":
                if (row.Name.Contains("Revolution", StringComparison.Ordinal))
                {
                    // UnitsNet states revolutions in radians with an approximate 2π; ISO 80000-3
                    // counts revolutions: 1 r/min = 1/60 s⁻¹ exactly.
                    dim *= Dimension.Of(Dimension.Rev);
                    factor = RevolutionFactor(row.Name) ?? factor / (2 * Math.PI);
                }
                else
                {
                    dim *= Dimension.Of(Dimension.Angle);
                }
                break;
            case "RotationalStiffness":
            case "RotationalStiffnessPerLength":
                dim /= Dimension.Of(Dimension.Angle);
                break;
            case "Torque":
                tag = Kinds.Torque;
                break;
            case "Energy":
                tag = Kinds.Energy;
                break;
        }
        return (factor, dim, tag);
    }

    private static double? RevolutionFactor(string name) => name switch
    {
        "RevolutionPerSecond" => 1.0,
        "RevolutionPerMinute" => 1.0 / 60,
        "RevolutionPerSecondSquared" => 1.0,
        "RevolutionPerMinutePerSecond" => 1.0 / 60,
        _ => null,
    };

    private void AddCurated()
    {
        foreach (var (symbol, name, scale, expression, note) in CuratedUnits.Additions)
        {
            string key = UnitText.Normalize(symbol);
            double factor;
            Dimension dim;
            Kind? tag = null;
            if (expression.StartsWith('#'))
            {
                factor = 1;
                dim = Dimension.Of(expression switch
                {
                    "#rev" => Dimension.Rev,
                    "#tooth" => Dimension.Tooth,
                    "#start" => Dimension.Start,
                    "#cycle" => Dimension.Cycle,
                    "#div" => Dimension.Division,
                    _ => Dimension.Stroke,
                });
            }
            else if (expression == "1")
            {
                factor = 1;
                dim = Dimension.None;
            }
            else
            {
                var res = UnitExpressionParser.Parse(expression, this);
                if (res.Unit is null) throw new InvalidOperationException($"curated unit {symbol}: {res.Error?.Message}");
                factor = res.Unit.Factor;
                dim = res.Unit.Dimension;
                tag = res.Unit.Tag;
            }
            // The trade's compound torque spellings (oz·in, Nm, kgf·cm…) name a torque, as N·m does.
            if (note is not null && dim.SiEquals(Dimension.FromSi(2, 1, -2))) tag = Kinds.Torque;
            _symbols[key] = new UnitDefinition(key, name, factor * scale, 0, dim, tag, "curated", note);
        }
    }

    private static string Humanize(string pascal)
    {
        var sb = new System.Text.StringBuilder();
        for (int i = 0; i < pascal.Length; i++)
        {
            if (i > 0 && char.IsUpper(pascal[i])) sb.Append(' ');
            sb.Append(char.ToLowerInvariant(pascal[i]));
        }
        return sb.ToString();
    }
}
