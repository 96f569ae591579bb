using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    private ValuePresenter? _presenter;
    private ValuePresenter Presenter => _presenter ??= new ValuePresenter(_display, _scope);

    private EvalFrame? _statementFrame;

    /// <summary>The top-level frame for the statement about to be evaluated (one object reused for all of them).</summary>
    private EvalFrame StatementFrame(TextSpan callSite, bool recordDependencies = false)
    {
        var frame = _statementFrame ??= new EvalFrame { Scope = _scope };
        frame.StartStatement(callSite, recordDependencies);
        return frame;
    }

    private StatementResult EvaluateDefinition(DefinitionSyntax d, int line, DefinitionSymbol? symbol, Dictionary<string, (SheetSyntax Syntax, DefinitionSyntax Definition)> overrides)
    {
        var frame = StatementFrame(d.Span, recordDependencies: true);
        var value = _eval.Evaluate(d.Value, frame);
        // The symbol Declare made for this very statement; a refused redefinition has none.
        if (symbol is null) return new DefinitionResult(d, line, null, null, isInput: false, isOverridden: false);
        symbol.IsInput = !frame.DependsOnSheet;
        bool overridden = false;
        // What the sheet itself gives, when it gives anything: an override must be the same kind of value.
        var own = _sink.StatementHasError ? Value.Unknown : value;
        if (overrides.TryGetValue(d.Name, out var o))
        {
            if (!symbol.IsInput)
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideNotInput, d.NameSpan, DiagnosticMessages.SetNotInput(d.Name)));
            }
            else
            {
                value = EvaluateOverride(o.Syntax, o.Definition, d);
                overridden = true;
                if (OverrideMismatch(d.Name, own, value) is { } mismatch)
                {
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideMismatch, d.NameSpan, $"--set {d.Name}: {mismatch}"));
                    value = Value.Unknown;
                }
            }
        }
        else if (_importOverrides.TryGetValue(d.Name, out var imported) && symbol.IsInput)
        {
            value = imported;
            overridden = true;
            if (OverrideMismatch(d.Name, own, value) is { } mismatch)
            {
                _scope.RefusedOverrides[d.Name] = mismatch;
                value = Value.Unknown;
            }
        }
        if (_sink.StatementHasError && !overridden) value = Value.Unknown;

        symbol.Value = value;
        symbol.Evaluated = true;
        symbol.IsOverridden = overridden;
        DisplayedValue? shown = null;
        string? kind = null;
        switch (value.Kind)
        {
            case ValueKind.Quantity:
                var root = overridden ? o.Definition?.Value ?? d.Value : d.Value;
                if (Presenter.TryNamedUnit(root, value.Quantity, out var unit))
                {
                    if (unit is not null && unit.Dimension.SiEquals(value.Quantity.Dimension)) symbol.DisplayUnit = unit;
                }
                else
                {
                    symbol.ChooseDisplayUnitLater(DeferredDisplayUnit.For(Presenter.ChoiceSystem));
                }
                // The shown value and the kind's name are made when the result is first read.
                return new DefinitionResult(d, line, symbol, Presenter);
            case ValueKind.List:
                var listUnit = Presenter.UnitFor(d.Value, new Quantity(value.List!.Values.FirstOrDefault(), value.List.Dimension, value.List.Tag));
                shown = Presenter.PresentList(value.List, listUnit);
                kind = "list of " + (Units.Kinds.Infer(value.List.Dimension)?.Name ?? value.List.Dimension.ToString());
                break;
            case ValueKind.Boolean:
                shown = Presenter.PresentOther(value);
                kind = "boolean";
                break;
            case ValueKind.Choice:
                shown = Presenter.PresentOther(value);
                kind = value.Choice!.Type.Name;
                break;
        }
        return new DefinitionResult(d, line, shown, kind, symbol.IsInput, overridden);
    }

    /// <summary>Why an override cannot stand in for the sheet's own value, or null when it can (or the sheet gives none).</summary>
    private static string? OverrideMismatch(string name, Value own, Value given)
    {
        if (own.IsUnknown || given.IsUnknown) return null;
        if (own.Kind == ValueKind.Quantity && given.Kind == ValueKind.Quantity)
        {
            var (a, b) = (own.Quantity.Dimension, given.Quantity.Dimension);
            return a.SiEquals(b) ? null : DiagnosticMessages.OverrideDimension(name, a, b);
        }
        bool same = own.Kind == given.Kind && (own.Kind != ValueKind.Choice || own.Choice!.Type == given.Choice!.Type)
            && (own.Kind != ValueKind.List || own.List!.Dimension.SiEquals(given.List!.Dimension));
        return same ? null : DiagnosticMessages.OverrideValueKind(name, own.Describe(), given.Describe());
    }

    private Value EvaluateOverride(SheetSyntax syntax, DefinitionSyntax definition, DefinitionSyntax target)
    {
        // The override's text is not the sheet's: evaluate it apart and report its problems at the definition it replaces.
        var sink = new DiagnosticSink();
        var evaluator = new ExpressionEvaluator(sink, _scope, syntax.Source, () => _currentLine, LastDependencyLine);
        var value = evaluator.Evaluate(definition.Value, new EvalFrame { Scope = _scope, CallSite = target.Span });
        foreach (var d in sink.Diagnostics.Where(d => d.Severity == Severity.Error))
        {
            _sink.Report(Diagnostic.Error(d.Code, target.NameSpan, $"--set {target.Name}: {d.Message}"));
        }
        return sink.Diagnostics.Any(d => d.Severity == Severity.Error) ? Value.Unknown : value;
    }

    private StatementResult EvaluateCheck(CheckSyntax c, int line)
    {
        string? description = c.Clauses.Description?.Value;
        if (c.Condition is not BinarySyntax { Operator: BinaryOperator.LessEqual or BinaryOperator.Less or BinaryOperator.GreaterEqual or BinaryOperator.Greater or BinaryOperator.Equal or BinaryOperator.NotEqual } cmp)
        {
            _eval.Evaluate(c.Condition, StatementFrame(c.Span));
            _sink.Report(Diagnostic.Error(DiagnosticCodes.NotAComparison, c.Condition.Span, DiagnosticMessages.NotAComparison));
            return new CheckResult(c, line, CheckStatus.NotEvaluated, "?", null, null, null, null, description, "not a comparison");
        }
        var frame = StatementFrame(c.Span);
        // Each side once, then the comparison: the same values and diagnostics, in the same order, as
        // evaluating the condition whole and then each side again for display.
        var left = _eval.Evaluate(cmp.Left, frame);
        var right = _eval.Evaluate(cmp.Right, frame);
        var outcome = _eval.CompareEvaluated(cmp, left, right, frame);
        var tolerance = c.Tolerance is null ? (Value?)null : _eval.Evaluate(c.Tolerance, frame);
        string op = _source.Slice(cmp.OperatorSpan);

        if (c.Tolerance is not null && cmp.Operator != BinaryOperator.Equal)
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.NotAComparison, c.Tolerance.Span, DiagnosticMessages.NotAComparison));
        }
        bool known = outcome.Kind == ValueKind.Boolean && left.Kind == ValueKind.Quantity && right.Kind == ValueKind.Quantity
            && !_sink.StatementHasError && (tolerance is null || tolerance.Value.Kind == ValueKind.Quantity);
        if (known && tolerance is { } tv && !tv.Quantity.Dimension.SiEquals(right.Quantity.Dimension))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.ComparisonMismatch, c.Tolerance!.Span,
                DiagnosticMessages.ComparisonMismatch("the tolerance", tv.Quantity.Dimension, "the target", right.Quantity.Dimension)));
            known = false;
        }
        if (!known)
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.CheckNotEvaluated, c.Span, DiagnosticMessages.CheckNotEvaluated));
            return new CheckResult(c, line, CheckStatus.NotEvaluated, op, null, null, null, null, description, "not evaluated");
        }
        var semantics = CheckSemantics.Compute(cmp.Operator, left.Quantity.Si, right.Quantity.Si, tolerance?.Quantity.Si);
        var limitUnit = Presenter.UnitFor(cmp.Right, right.Quantity);
        var valueUnit = Presenter.UnitFor(cmp.Left, left.Quantity);
        int digits = _display.Digits;
        var shownValue = Presenter.Present(left.Quantity, valueUnit);
        var shownLimit = Presenter.Present(right.Quantity, limitUnit);
        bool equal = left.Quantity.Si == right.Quantity.Si;
        while (!semantics.Passed && !equal && shownValue.Text == shownLimit.Text && digits < 15)
        {
            // A failing check never shows both sides equal: add figures until they differ.
            digits++;
            shownValue = Presenter.Present(left.Quantity, valueUnit, digits);
            shownLimit = Presenter.Present(right.Quantity, limitUnit, digits);
        }
        DisplayedValue? margin = semantics.Margin is double m ? Presenter.Present(right.Quantity with { Si = m }, limitUnit, digits) : null;
        string text = $"{shownValue.Primary} {op} {shownLimit.Primary}" + (tolerance is { } t ? $" within {Presenter.Present(t.Quantity, Presenter.UnitFor(c.Tolerance!, t.Quantity)).Primary}" : "");
        var status = semantics.Passed ? CheckStatus.Passed : CheckStatus.Failed;
        if (!semantics.Passed)
        {
            string detail = text + " does not hold" + (semantics.Utilisation is double u ? $" (utilisation {Display.NumberFormatter.Format(u * 100, 3)} %" : " (") +
                (margin is null ? ")" : $"{(semantics.Utilisation is null ? "" : ", ")}margin {margin.Primary})");
            _sink.Report(Diagnostic.Error(DiagnosticCodes.CheckFailed, c.Span, DiagnosticMessages.CheckFailed(detail)));
        }
        return new CheckResult(c, line, status, op, shownValue, shownLimit, semantics.Utilisation, margin, description, text);
    }
}
