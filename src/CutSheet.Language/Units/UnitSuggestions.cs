using CutSheet.Language.Text;
namespace CutSheet.Language.Units;

/// <summary>
/// Suggests a known symbol for an unknown one: a case fold, then the nearest by edit distance.
/// A symbol of one or two characters is one edit from dozens of others, so it gets a case fold
/// only; the inch and foot marks are never suggested (they are reported wherever written).
/// </summary>
internal static class UnitSuggestions
{
    public static string? Suggest(string symbol, UnitCatalog catalog)
    {
        string? best = null;
        int bestDistance = int.MaxValue;
        foreach (var def in catalog.Symbols)
        {
            if (def.Symbol is "\"" or "'" or "″" or "′") continue;
            if (string.Equals(def.Symbol, symbol, StringComparison.OrdinalIgnoreCase)) return def.Symbol;
            if (symbol.Length < 3 || Math.Abs(def.Symbol.Length - symbol.Length) > 2) continue;
            int d = EditDistance.Compute(symbol, def.Symbol);
            if (d < bestDistance || (d == bestDistance && best is not null && string.CompareOrdinal(def.Symbol, best) < 0))
            {
                bestDistance = d;
                best = def.Symbol;
            }
        }
        return bestDistance <= Math.Max(1, symbol.Length / 3) ? best : null;
    }
}
