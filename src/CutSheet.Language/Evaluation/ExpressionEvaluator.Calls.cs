using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

internal sealed partial class ExpressionEvaluator
{
    private Value Call(CallSyntax call, EvalFrame f)
    {
        if (call.Callee.Qualifier is null && f.Locals?.ContainsKey(call.Callee.Name) == true)
            return Error(f, DiagnosticCodes.NotAFunction, call.Callee.Span, DiagnosticMessages.NotAFunction(call.Callee.Name));
        object? symbol = call.Callee.Qualifier is null ? f.Scope.Find(call.Callee.Name) : ResolveName(call.Callee, f, out _);
        switch (symbol)
        {
            case FunctionSymbol fn:
                return CallUser(fn, call, f);
            case null when call.Callee.Qualifier is null && Builtins.IsFunction(call.Callee.Name):
                return CallBuiltin(call, f);
            case null:
                var names = f.Scope.Functions.Keys.Concat(f.Scope.Imported.Where(i => i.Value.Symbol is FunctionSymbol).Select(i => i.Key)).Concat(Builtins.FunctionNames);
                EvaluateArguments(call, f);
                if (LibraryHint(call.Callee, f, DiagnosticCodes.UnknownFunction)) return Value.Unknown;
                var suggestion = Suggest(call.Callee.Name, names);
                if (suggestion is null && LibraryFunctionNear(call.Callee, f)) return Value.Unknown;
                return Error(f, DiagnosticCodes.UnknownFunction, call.Callee.Span, DiagnosticMessages.UnknownFunction(call.Callee.FullName, suggestion));
            default:
                EvaluateArguments(call, f);
                return Error(f, DiagnosticCodes.NotAFunction, call.Callee.Span, DiagnosticMessages.NotAFunction(call.Callee.FullName));
        }
    }

    private Value[] EvaluateArguments(CallSyntax call, EvalFrame f)
    {
        var values = new Value[call.Arguments.Count];
        for (int i = 0; i < values.Length; i++) values[i] = Evaluate(call.Arguments[i].Value, f);
        return values;
    }

    /// <summary>
    /// <c>sin(30)</c>: a plain number is radians (ISO 80000-3, rad = 1), but a literal of more than
    /// a full turn of radians is far likelier to be degrees written without their unit.
    /// </summary>
    private void PlainNumberAsRadians(CallSyntax call, EvalFrame f)
    {
        var argument = call.Arguments[0].Value;
        var literal = argument as QuantityLiteralSyntax ?? (argument as UnarySyntax)?.Operand as QuantityLiteralSyntax;
        if (literal is not { Unit: null } || Math.Abs(literal.Number) <= 2 * Math.PI) return;
        bool negated = argument is UnarySyntax { Operator: UnaryOperator.Negate };
        // The literal's own text: inside an imported function the spans are not this sheet's.
        string number = (negated ? "-" : "") + literal.NumberText;
        double value = negated ? -literal.Number : literal.Number;
        var fix = new Fix(DiagnosticMessages.PlainNumberAsDegreesFix(number), [new TextEdit(new TextSpan(literal.Span.End, 0), " deg")]);
        Warn(f, DiagnosticCodes.PlainNumberAsRadians, argument.Span, DiagnosticMessages.PlainNumberAsRadians(call.Callee.Name, number, value * 180 / Math.PI), fix);
    }

    private Value CallBuiltin(CallSyntax call, EvalFrame f)
    {
        for (int i = 0; i < call.Arguments.Count; i++)
        {
            var a = call.Arguments[i];
            if (a.Name is not null) return Error(f, DiagnosticCodes.ArgumentList, a.NameSpan, DiagnosticMessages.UnknownArgument(call.Callee.Name, a.Name));
        }
        var args = EvaluateArguments(call, f);
        foreach (var a in args) if (a.IsUnknown) return Value.Unknown;
        if (call.Callee.Name is "sin" or "cos" or "tan" && call.Arguments.Count == 1) PlainNumberAsRadians(call, f);
        var result = Builtins.Call(call.Callee.Name, args, call, out var problem);
        if (problem is not null)
        {
            var (code, span, message) = problem.Value;
            if (f.CheckOnly && code is DiagnosticCodes.DomainError or DiagnosticCodes.DivisionByZero or DiagnosticCodes.ListMismatch) return Value.Unknown;
            return Error(f, code, span, message);
        }
        if (result.Kind == ValueKind.Quantity && !Finite(f, call.Span, result.Quantity.Si)) return Value.Unknown;
        return result;
    }

    private Value CallUser(FunctionSymbol fn, CallSyntax call, EvalFrame f)
    {
        string name = call.Callee.FullName;
        if (f.Depth >= MaxCallDepth)
            return Error(f, DiagnosticCodes.LimitExceeded, call.Span, DiagnosticMessages.LimitExceeded($"calls nested more than {MaxCallDepth} deep"));

        // Match arguments to parameters: positional first, then named.
        var bound = new ArgumentSyntax?[fn.Parameters.Count];
        bool named = false, ok = true;
        for (int i = 0; i < call.Arguments.Count; i++)
        {
            var a = call.Arguments[i];
            int index;
            if (a.Name is null)
            {
                if (named) { Error(f, DiagnosticCodes.ArgumentList, a.Span, DiagnosticMessages.PositionalAfterNamed); ok = false; continue; }
                index = i;
                if (index >= bound.Length) { Error(f, DiagnosticCodes.ArgumentList, a.Span, DiagnosticMessages.TooManyArguments(name, bound.Length)); ok = false; continue; }
            }
            else
            {
                named = true;
                index = ParameterIndex(fn, a.Name);
                if (index < 0) { Error(f, DiagnosticCodes.ArgumentList, a.NameSpan, DiagnosticMessages.UnknownArgument(name, a.Name)); ok = false; continue; }
                if (bound[index] is not null) { Error(f, DiagnosticCodes.ArgumentList, a.NameSpan, DiagnosticMessages.DuplicateArgument(name, a.Name)); ok = false; continue; }
            }
            bound[index] = a;
        }

        if (f.RecordDependencies && ReferenceEquals(fn.Home, _top) && fn.ReadsSheetDefinitions) f.DependsOnSheet = true;
        if (!fn.IsValid)
        {
            // Its declaration is reported; evaluate the arguments for their own diagnostics and stop.
            foreach (var a in call.Arguments) Evaluate(a.Value, f);
            return Value.Unknown;
        }
        var locals = new Dictionary<string, Value>(StringComparer.Ordinal);
        bool foreign = f.Foreign || !ReferenceEquals(fn.Home, _top);
        var callSite = f.Foreign ? f.CallSite : call.Span;
        var bodyFrame = new EvalFrame
        {
            Scope = fn.Home, Locals = locals, Depth = f.Depth + 1, CheckOnly = f.CheckOnly, CallSite = callSite,
            Foreign = foreign, Function = fn,
        };
        bool unknown = false;
        for (int i = 0; i < fn.Parameters.Count; i++)
        {
            var p = fn.Parameters[i];
            Value v;
            if (bound[i] is { } a)
            {
                v = Evaluate(a.Value, f);
                if (!v.IsUnknown) v = CheckArgument(fn, name, p, a.Value, v, f);
            }
            else if (p.Syntax.Default is { } def)
            {
                v = Evaluate(def, bodyFrame);
                if (!v.IsUnknown) v = CheckArgument(fn, name, p, def, v, bodyFrame);
            }
            else
            {
                Error(f, DiagnosticCodes.ArgumentList, call.Span, DiagnosticMessages.MissingArgument(name, p.Name));
                ok = false;
                v = Value.Unknown;
            }
            if (v.IsUnknown) unknown = true;
            locals[p.Name] = v;
        }
        if (!ok || unknown || !fn.IsValid) return Value.Unknown;
        return InvokeBody(fn, name, call, bodyFrame, f);
    }

    /// <summary>The position of the parameter with this name, or −1 (a loop: a lambda would capture the argument per call).</summary>
    private static int ParameterIndex(FunctionSymbol fn, string name)
    {
        for (int i = 0; i < fn.Parameters.Count; i++) if (fn.Parameters[i].Name == name) return i;
        return -1;
    }

    /// <summary>Runs a function's clauses and formula in its own frame; cautions fire at the call site.</summary>
    internal Value InvokeBody(FunctionSymbol fn, string name, CallSyntax? call, EvalFrame body, EvalFrame caller)
    {
        var syntax = fn.Syntax;
        // Index loops: foreach over an IReadOnlyList boxes its enumerator, on every call of the function.
        var clauses = syntax.Clauses;
        for (int i = 0; i < clauses.Locals.Count; i++)
        {
            var local = clauses.Locals[i];
            body.Locals![local.Name] = Evaluate(local.Value, body);
        }
        for (int i = 0; i < clauses.Require.Count; i++)
        {
            var req = clauses.Require[i];
            var cond = Evaluate(req.Condition, body);
            if (cond.Kind == ValueKind.Boolean && !cond.Boolean && !body.CheckOnly)
            {
                string condition = ConditionText(fn, req.Condition);
                var span = body.Foreign ? body.CallSite : call?.Span ?? req.Span;
                _sink.Report(new Diagnostic(DiagnosticCodes.RequirementFailed, Severity.Error, span,
                    DiagnosticMessages.RequirementFailed(name, condition, req.Message?.Value), RelatedFor(fn, req.Span, body), []));
                return Value.Unknown;
            }
        }
        var result = Evaluate(syntax.Body, body);
        if (!body.CheckOnly)
        {
            var site = body.Foreign ? body.CallSite : call?.Span ?? syntax.Span;
            for (int i = 0; i < clauses.Valid.Count; i++)
            {
                var valid = clauses.Valid[i];
                var cond = Evaluate(valid.Condition, body);
                if (cond.Kind == ValueKind.Boolean && !cond.Boolean)
                {
                    Fire(CautionLevel.Caution, DiagnosticMessages.OutsideValidity(name, ConditionText(fn, valid.Condition), valid.Message?.Value), site, fn.Name, DiagnosticCodes.OutsideValidity);
                }
            }
            for (int i = 0; i < clauses.Cautions.Count; i++)
            {
                var caution = clauses.Cautions[i];
                var cond = Evaluate(caution.Condition, body);
                if (cond.Kind == ValueKind.Boolean && cond.Boolean) Fire(caution.Level, caution.Message.Value, site, fn.Name, null);
            }
        }
        if (result.IsUnknown) return result;
        return CheckReturn(fn, name, result, body);
    }

    private IReadOnlyList<RelatedLocation> RelatedFor(FunctionSymbol fn, TextSpan span, EvalFrame body) =>
        body.Foreign ? [new RelatedLocation(span, "in " + fn.Name, fn.Home.Path)] : [];

    private static string ConditionText(FunctionSymbol fn, ExpressionSyntax condition)
    {
        var source = fn.Home.SourceText;
        return source is null ? "its stated range" : source.Slice(condition.Span);
    }

    private void Fire(CautionLevel level, string message, TextSpan site, string? origin, string? code)
    {
        foreach (var c in _sink.Cautions) if (c.Message == message && c.Span == site) return;
        _sink.Cautions.Add(new CautionResult(level, message, site, null, origin) { Code = code });
    }

    private Value CheckReturn(FunctionSymbol fn, string name, Value result, EvalFrame body)
    {
        if (fn.ReturnsBoolean) return result.Kind == ValueKind.Boolean ? result : TypeError(body, fn.Syntax.Body.Span, "true or false", result);
        if (fn.ReturnChoice is not null)
            return result.Kind == ValueKind.Choice && result.Choice!.Type == fn.ReturnChoice ? result : TypeError(body, fn.Syntax.Body.Span, "an option of " + fn.ReturnChoice.Name, result);
        if (fn.ReturnsList) return result.Kind == ValueKind.List ? result : TypeError(body, fn.Syntax.Body.Span, "a list", result);
        var kind = fn.ReturnKind;
        if (kind is null) return result;
        if (result.Kind != ValueKind.Quantity) return TypeError(body, fn.Syntax.Body.Span, kind.Description, result);
        var q = result.Quantity;
        if (!q.Dimension.SiEquals(kind.Dimension))
        {
            var saved = new EvalFrame { Scope = body.Scope, Foreign = body.Foreign, CallSite = body.CallSite, Function = fn };
            return Error(saved, DiagnosticCodes.ReturnKind, fn.Syntax.ReturnKindSpan,
                DiagnosticMessages.ReturnKind(name, kind, Label(fn.Syntax.Body, q, body), q.Dimension));
        }
        // The declared return kind settles the kind (torque, not energy; a lead per revolution).
        double factor = 1;
        if (q.Dimension[Dimension.Angle] != kind.Dimension[Dimension.Angle] && q.Dimension.RotationOrder == kind.Dimension.RotationOrder)
        {
            factor = Math.Pow(2 * Math.PI, q.Dimension[Dimension.Rev] - kind.Dimension[Dimension.Rev]);
        }
        return Value.Of(new Quantity(q.Si * factor, kind.Dimension, kind.IsTagged ? kind : q.Tag is not null && q.Tag.Dimension == kind.Dimension ? q.Tag : null));
    }

    /// <summary>
    /// What a counted or angular factor of an argument says against its parameter, or null when
    /// nothing: a plain value where a per-revolution (per-tooth…) one is expected is the
    /// lead-for-pitch trap; two different counts disagree; an angle dropped or supplied between a
    /// frequency and an angular velocity hides 2π. A count or angle left over in a product
    /// (2·π·n·T, π·D·n) is dimension one and passes.
    /// </summary>
    private static string? CountMismatch(Dimension have, Dimension want)
    {
        bool frequency = have.SiEquals(Dimension.FromSi(0, 0, -1));
        for (int i = Dimension.SiCount; i < Dimension.Count; i++)
        {
            int h = have[i], w = want[i];
            if (h == w) continue;
            string name = Dimension.SoftName(i);
            if (i == Dimension.Angle)
            {
                if (frequency) return h == 0 ? "a plain frequency where an angle per time is expected (ω = 2π·f)" : "an angle per time where a plain frequency is expected";
                if (h == 0 && w > 0 && have.IsNone) return "a plain number where an angle is expected is read as radians; write deg or rad";
                continue;
            }
            if (w < 0 && h == 0) return $"a plain value where a value per {name} is expected (a pitch is not a lead on a multi-start screw)";
            if (h != 0 && w != 0) return $"a value counted in {name}{Units.Superscript.Of(h)} where {name}{Units.Superscript.Of(w)} is expected";
            if (h < 0 && w == 0 && HasOtherCount(want, i)) return $"a value per {name} where another count is expected";
        }
        return null;
    }

    private static bool HasOtherCount(Dimension d, int except)
    {
        for (int i = Dimension.SiCount; i < Dimension.Count; i++) if (i != except && i != Dimension.Angle && d[i] != 0) return true;
        return false;
    }

    /// <summary>
    /// Checks an argument against its parameter's declared kind and gives the function the value
    /// in that kind. Dimensions must agree; revolutions against radians is an error; a plain
    /// value where a per-revolution (or per-tooth…) quantity is expected is a warning (the
    /// lead-for-pitch trap); a count a plain value lacks is supplied silently (n = v/(π·D) is a
    /// rotational frequency).
    /// </summary>
    private Value CheckArgument(FunctionSymbol fn, string name, ParameterSymbol p, ExpressionSyntax syntax, Value v, EvalFrame f)
    {
        if (p.Choice is not null)
            return v.Kind == ValueKind.Choice && v.Choice!.Type == p.Choice ? v : TypeError(f, syntax.Span, $"an option of {p.Choice.Name} for '{p.Name}'", v);
        if (p.IsBoolean)
            return v.Kind == ValueKind.Boolean ? v : TypeError(f, syntax.Span, $"true or false for '{p.Name}'", v);
        if (p.IsList)
        {
            if (v.Kind == ValueKind.Quantity) return Value.Of(new QuantityList([v.Quantity.Si], v.Quantity.Dimension, v.Quantity.Tag));
            return v.Kind == ValueKind.List ? v : TypeError(f, syntax.Span, $"a list for '{p.Name}'", v);
        }
        if (p.Kind is not { } kind) return Value.Unknown;
        if (v.Kind != ValueKind.Quantity) return TypeError(f, syntax.Span, $"{kind.Description} for '{p.Name}'", v);
        var q = v.Quantity;
        var d = q.Dimension;
        var k = kind.Dimension;
        if (!d.SiEquals(k))
        {
            var message = DiagnosticMessages.ArgumentDimension(name, p.Name, kind, Label(syntax, q, f), d);
            return DimensionError(f, syntax.Span, message, syntax, d, new ListSyntax(syntax.Span, []), k, DiagnosticCodes.ArgumentDimension);
        }
        const double factor = 1;
        if (d.RotationOrder == k.RotationOrder && d.RotationOrder != 0 && d[Dimension.Angle] != k[Dimension.Angle])
        {
            return Error(f, DiagnosticCodes.ArgumentRotation, syntax.Span, DiagnosticMessages.ArgumentRotation(name, p.Name, kind, Label(syntax, q, f)));
        }
        if (CountMismatch(d, k) is { } what)
        {
            Warn(f, DiagnosticCodes.ArgumentCount, syntax.Span, DiagnosticMessages.ArgumentCount(name, p.Name, kind, Label(syntax, q, f), what));
        }
        if (kind.IsTagged && q.Tag is not null && q.Tag != kind)
        {
            // Declared kinds of one dimension (a drive efficiency for a back-drive one) are a caution:
            // the number may be close, but it answers another question.
            if (kind.Basis is null && q.Tag.Basis is null)
                return Error(f, DiagnosticCodes.ArgumentKind, syntax.Span, DiagnosticMessages.ArgumentKind(name, p.Name, kind, q.Tag));
            if (!f.CheckOnly && !f.Foreign)
                Fire(CautionLevel.Caution, DiagnosticMessages.DeclaredKindMismatch(name, p.Name, kind, q.Tag), syntax.Span, null, DiagnosticCodes.ArgumentKind);
        }
        return Value.Of(new Quantity(q.Si * factor, k, kind.IsTagged ? kind : null));
    }
}
