using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

/// <summary>
/// A definition's result. <see cref="Value"/> is null when the value is unknown (an error here
/// or upstream). <see cref="IsInput"/> is true for definitions that depend on no other
/// definition of the sheet.
/// </summary>
public sealed record DefinitionResult(
    DefinitionSyntax Definition, int Line, string Name, DisplayedValue? Value, string? Kind, bool IsInput,
    bool IsAssumed, string? Source, string? Description, bool IsOverridden)
    : StatementResult(Definition, Line);
