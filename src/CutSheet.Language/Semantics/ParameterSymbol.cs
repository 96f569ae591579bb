using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Semantics;

/// <summary>A function parameter with its declared kind (a kind of quantity, a choice, or <c>list</c>).</summary>
public sealed record ParameterSymbol(ParameterSyntax Syntax, Kind? Kind, ChoiceType? Choice, bool IsList, bool IsBoolean)
{
    public string Name => Syntax.Name;
}
