using System.Collections.Concurrent;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// What evaluation needs to know about unit text as written (<c>mm</c>, <c>N·m</c>): its resolution
/// and the symbols it names. Computed once per <see cref="UnitSyntax"/> and kept on the node, so a
/// literal's unit is not looked up by text and scanned for names on every evaluation.
/// </summary>
internal sealed class UnitFacts
{
    private UnitFacts(string text)
    {
        Text = text;
        Resolution = UnitCatalog.Default.Resolve(text);
        Symbols = SymbolsOf(text);
    }

    /// <summary>The text these facts were computed from; a node copied with other text looks its own up.</summary>
    public string Text { get; }

    public UnitResolution Resolution { get; }

    /// <summary>The symbols of the unit text in order: <c>N*t</c> gives N and t.</summary>
    public string[] Symbols { get; }

    /// <summary>
    /// Facts by unit text, shared by every tree: a sheet parsed afresh on each run has new nodes but
    /// writes the same few units, so each node's first use costs one look-up and no allocation.
    /// </summary>
    private static readonly ConcurrentDictionary<string, UnitFacts> ByText = new(StringComparer.Ordinal);

    public static UnitFacts Of(UnitSyntax unit)
    {
        var facts = unit.Facts.Value;
        if (facts is null || !string.Equals(facts.Text, unit.Text, StringComparison.Ordinal))
        {
            if (!ByText.TryGetValue(unit.Text, out facts))
            {
                facts = new UnitFacts(unit.Text);
                // Like the catalog's own cache: bounded, since unit text comes from whatever is typed.
                if (ByText.Count < 100_000) ByText[unit.Text] = facts;
            }
            unit.Facts.Value = facts;
        }
        return facts;
    }

    private static string[] SymbolsOf(string unitText)
    {
        List<string>? symbols = null;
        int i = 0;
        while (i < unitText.Length)
        {
            if (!char.IsLetter(unitText[i]) && unitText[i] != '_') { i++; continue; }
            int start = i;
            while (i < unitText.Length && (char.IsLetterOrDigit(unitText[i]) || unitText[i] == '_')) i++;
            (symbols ??= []).Add(unitText[start..i]);
        }
        return symbols is null ? [] : symbols.ToArray();
    }
}
