using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Semantics;

/// <summary>A data table keyed by the options of a choice; each row carries its source.</summary>
public sealed class TableSymbol(TableSyntax syntax, ChoiceType? key, string? path)
{
    public TableSyntax Syntax { get; } = syntax;
    public string Name => Syntax.Name;
    public ChoiceType? Key { get; } = key;
    public string? Path { get; } = path;
    public Dictionary<string, (Dictionary<string, TableCell> Cells, string? Source)> Rows { get; } = new(StringComparer.Ordinal);
    public HashSet<string> Columns { get; } = new(StringComparer.Ordinal);
}
