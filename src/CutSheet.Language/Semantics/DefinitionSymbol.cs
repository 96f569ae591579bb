using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Language.Semantics;

/// <summary>A definition of a sheet; its value and display unit are filled in as the sheet evaluates.</summary>
public sealed class DefinitionSymbol(DefinitionSyntax syntax, int statementIndex, int line, string? path)
{
    /// <summary>A <see cref="ResolvedUnit"/>, a <see cref="DeferredDisplayUnit"/> still to be chosen, or null.</summary>
    private object? _displayUnit;
    private DisplayedValue? _shown;

    public DefinitionSyntax Syntax { get; } = syntax;
    public string Name => Syntax.Name;
    public int StatementIndex { get; } = statementIndex;
    public int Line { get; } = line;
    public string? Path { get; } = path;
    public bool Evaluated { get; set; }
    public Value Value { get; set; }
    public bool IsInput { get; set; }
    public bool IsOverridden { get; set; }

    /// <summary>The unit the value is shown in (and that a lone reference to it inherits), or null.</summary>
    public ResolvedUnit? DisplayUnit
    {
        get
        {
            // One read of the field: another thread may be choosing the same unit at the same time,
            // and both store the same answer.
            var state = _displayUnit;
            if (state is not DeferredDisplayUnit deferred) return (ResolvedUnit?)state;
            var chosen = deferred.Choose(Value.Quantity);
            _displayUnit = chosen;
            return chosen;
        }
        set => _displayUnit = value;
    }

    /// <summary>
    /// False while the unit is still to be chosen by the sheet's unit system: those units never
    /// have an offset (see <see cref="DeferredDisplayUnit"/>), so asking does not force the choice.
    /// </summary>
    internal bool DisplayUnitHasOffset => _displayUnit is ResolvedUnit { HasOffset: true };

    /// <summary>Leaves the display unit to be chosen by the sheet's unit system when first asked for.</summary>
    internal void ChooseDisplayUnitLater(DeferredDisplayUnit deferred) => _displayUnit = deferred;

    /// <summary>The value as shown, made when first asked for; the presenter holds the sheet's display settings.</summary>
    internal DisplayedValue Shown(ValuePresenter presenter) => _shown ??= presenter.Present(Value.Quantity, DisplayUnit);
}
