using CutSheet.Language.Evaluation;
using CutSheet.Language.Semantics;
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
    : StatementResult(Definition, Line)
{
    /// <summary>
    /// The evaluated symbol of a quantity whose shown value and kind are made when first asked
    /// for (most results of a large sheet are never looked at one by one); null otherwise.
    /// </summary>
    private readonly (DefinitionSymbol Symbol, ValuePresenter Presenter)? _deferred;

    private readonly DisplayedValue? _value = Value;
    private readonly string? _kind = Kind;

    internal DefinitionResult(DefinitionSyntax definition, int line, DefinitionSymbol symbol, ValuePresenter presenter,
        bool isAssumed, string? source, string? description)
        : this(definition, line, definition.Name, null, null, symbol.IsInput, isAssumed, source, description, symbol.IsOverridden)
    {
        _deferred = (symbol, presenter);
    }

    public DisplayedValue? Value
    {
        get => _deferred is var (symbol, presenter) ? symbol.Shown(presenter) : _value;
        init => _value = value;
    }

    /// <summary>The kind's name, or the SI dimension when no kind is named for it.</summary>
    public string? Kind
    {
        get => _deferred is var (symbol, _) ? symbol.Value.Quantity.Kind?.Name ?? symbol.Value.Quantity.Dimension.ToString() : _kind;
        init => _kind = value;
    }
}
