using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Semantics;

/// <summary>A function of a sheet, evaluated in the scope of the sheet that declares it (its home).</summary>
public sealed class FunctionSymbol(FunctionSyntax syntax, SheetScope home, int line)
{
    public FunctionSyntax Syntax { get; } = syntax;
    public string Name => Syntax.Name;
    public SheetScope Home { get; } = home;
    public int Line { get; } = line;
    public List<ParameterSymbol> Parameters { get; } = [];
    public Kind? ReturnKind { get; set; }
    public ChoiceType? ReturnChoice { get; set; }
    public bool ReturnsBoolean { get; set; }
    public bool ReturnsList { get; set; }
    public bool IsValid { get; set; } = true;

    /// <summary>True when the function's formulas name a definition of its own sheet (so a call depends on the sheet).</summary>
    public bool ReadsSheetDefinitions { get; set; }

    /// <summary>A one-line signature for hover, completion and docs.</summary>
    public string Signature =>
        $"{Name}({string.Join(", ", Syntax.Parameters.Select(p => $"{p.Name}: {p.KindName}"))}): {Syntax.ReturnKind}";
}
