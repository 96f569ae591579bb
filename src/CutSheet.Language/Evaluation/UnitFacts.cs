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

    /// <summary>The text these facts were computed from; a node copied with other text computes its own.</summary>
    public string Text { get; }

    public UnitResolution Resolution { get; }

    /// <summary>The symbols of the unit text in order: <c>N*t</c> gives N and t.</summary>
    public string[] Symbols { get; }

    public static UnitFacts Of(UnitSyntax unit)
    {
        var facts = unit.Facts.Value;
        if (facts is null || !ReferenceEquals(facts.Text, unit.Text))
        {
            facts = new UnitFacts(unit.Text);
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
