using CutSheet.Language.Evaluation;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Semantics;

/// <summary>A definition of a sheet; its value and display unit are filled in as the sheet evaluates.</summary>
public sealed class DefinitionSymbol(DefinitionSyntax syntax, int statementIndex, int line, string? path)
{
    public DefinitionSyntax Syntax { get; } = syntax;
    public string Name => Syntax.Name;
    public int StatementIndex { get; } = statementIndex;
    public int Line { get; } = line;
    public string? Path { get; } = path;
    public bool Evaluated { get; set; }
    public Value Value { get; set; }
    public ResolvedUnit? DisplayUnit { get; set; }
    public bool IsInput { get; set; }
    public bool IsOverridden { get; set; }
}
