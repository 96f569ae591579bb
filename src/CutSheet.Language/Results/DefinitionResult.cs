using CutSheet.Language.Evaluation;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

/// <summary>
/// A definition's result. <see cref="Value"/> is null when the value is unknown (an error here
/// or upstream). <see cref="IsInput"/> is true for definitions that depend on no other
/// definition of the sheet. The clauses (<see cref="IsAssumed"/>, <see cref="Source"/>,
/// <see cref="Description"/>) are read from the syntax, so a result costs one small object.
/// </summary>
public sealed record DefinitionResult : StatementResult
{
    /// <summary>
    /// The evaluated symbol of a quantity whose shown value and kind are made when first asked
    /// for (most results of a large sheet are never looked at one by one); null otherwise.
    /// </summary>
    private readonly DefinitionSymbol? _symbol;
    private readonly ValuePresenter? _presenter;

    private readonly DisplayedValue? _value;
    private readonly string? _kind;

    /// <summary>A quantity: its shown value and kind come from the symbol when first read.</summary>
    internal DefinitionResult(DefinitionSyntax definition, int line, DefinitionSymbol symbol, ValuePresenter presenter)
        : base(definition, line)
    {
        _symbol = symbol;
        _presenter = presenter;
        IsInput = symbol.IsInput;
        IsOverridden = symbol.IsOverridden;
    }

    /// <summary>Any other value (a list, a boolean, a choice), or an unknown one (<paramref name="value"/> null).</summary>
    internal DefinitionResult(DefinitionSyntax definition, int line, DisplayedValue? value, string? kind, bool isInput, bool isOverridden)
        : base(definition, line)
    {
        _value = value;
        _kind = kind;
        IsInput = isInput;
        IsOverridden = isOverridden;
    }

    public DefinitionSyntax Definition => (DefinitionSyntax)Syntax;

    public string Name => Definition.Name;

    public DisplayedValue? Value => _symbol is { } symbol ? symbol.Shown(_presenter!) : _value;

    /// <summary>The kind's name, or the SI dimension when no kind is named for it.</summary>
    public string? Kind => _symbol is { } symbol ? symbol.Value.Quantity.Kind?.Name ?? symbol.Value.Quantity.Dimension.ToString() : _kind;

    public bool IsInput { get; }

    /// <summary>True when <c>--set</c> or an import's <c>with</c> gave the value instead of the sheet.</summary>
    public bool IsOverridden { get; }

    public bool IsAssumed => Definition.Clauses.Assumed is not null;

    public string? Source => Definition.Clauses.Source?.Value;

    public string? Description => Definition.Clauses.Description?.Value;
}
