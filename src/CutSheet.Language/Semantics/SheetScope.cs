namespace CutSheet.Language.Semantics;

/// <summary>
/// The names of one sheet: its own definitions, functions, choices, options and tables, the
/// namespaces of <c>use … as</c> imports, and the symbols of unqualified imports. A sheet
/// exports only its own symbols, not those it imports.
/// </summary>
public sealed class SheetScope(string? path, string displayName)
{
    public string? Path { get; } = path;

    /// <summary>How the sheet is named in messages: a library name or a path relative to the importer.</summary>
    public string DisplayName { get; } = displayName;

    /// <summary>The sheet's text, for quoting conditions and formulas in messages.</summary>
    public CutSheet.Language.Text.SourceText? SourceText { get; set; }

    public Dictionary<string, DefinitionSymbol> Definitions { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, FunctionSymbol> Functions { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, ChoiceType> Choices { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, ChoiceOption> Options { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, TableSymbol> Tables { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, SheetScope> Namespaces { get; } = new(StringComparer.Ordinal);
    public Dictionary<string, Units.Kind> Kinds { get; } = new(StringComparer.Ordinal);

    /// <summary>
    /// Inputs whose override from an importer's <c>with</c> was refused because it is not the same
    /// kind of value as the sheet's own, with the reason; the importer reports it at its value.
    /// </summary>
    public Dictionary<string, string> RefusedOverrides { get; } = new(StringComparer.Ordinal);

    /// <summary>Symbols brought in by unqualified imports, with the sheet each came from.</summary>
    public Dictionary<string, (object Symbol, SheetScope From)> Imported { get; } = new(StringComparer.Ordinal);

    /// <summary>A symbol this sheet itself declares (not an import), or null.</summary>
    public object? FindOwn(string name) =>
        Definitions.GetValueOrDefault(name) as object
        ?? Functions.GetValueOrDefault(name) as object
        ?? Options.GetValueOrDefault(name) as object
        ?? Tables.GetValueOrDefault(name) as object
        ?? Choices.GetValueOrDefault(name) as object
        ?? Kinds.GetValueOrDefault(name);

    /// <summary>A symbol visible in this sheet, own first, then unqualified imports.</summary>
    public object? Find(string name) => FindOwn(name) ?? (Imported.TryGetValue(name, out var i) ? i.Symbol : null);

    public IEnumerable<(string Name, object Symbol)> OwnSymbols()
    {
        foreach (var d in Definitions) yield return (d.Key, d.Value);
        foreach (var f in Functions) yield return (f.Key, f.Value);
        foreach (var o in Options) yield return (o.Key, o.Value);
        foreach (var t in Tables) yield return (t.Key, t.Value);
        foreach (var c in Choices) yield return (c.Key, c.Value);
        foreach (var k in Kinds) yield return (k.Key, k.Value);
    }
}
