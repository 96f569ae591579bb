using System.Runtime.InteropServices;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    /// <summary>
    /// The line where each of the sheet's own names other than definitions was first declared; a
    /// definition's first line is its symbol's (see <see cref="TryFirstLine"/>), so the thousands
    /// of definitions of a large sheet are hashed into one dictionary, not two.
    /// </summary>
    private readonly Dictionary<string, int> _declaredAt = new(StringComparer.Ordinal);

    /// <summary>The symbol each definition statement declared, by statement index (null where the name was refused).</summary>
    private DefinitionSymbol?[] _definitionAt = [];

    /// <summary>
    /// Declares the sheet's own names; a name is declared once, and never over an import or a
    /// constant. Finds each statement's line on the way (<see cref="MapLine"/>).
    /// </summary>
    private void Declare()
    {
        var statements = _statements;
        // Sized once from the statement count: a large sheet would otherwise rehash it a dozen times.
        _scope.Definitions.EnsureCapacity(_scope.Definitions.Count + statements.Count);
        _definitionAt = new DefinitionSymbol?[statements.Count];
        _statementLines = new int[statements.Count];
        int line = 0;
        for (int i = 0; i < statements.Count; i++)
        {
            var statement = statements[i];
            line = MapLine(i, line);
            switch (statement)
            {
                case DefinitionSyntax d:
                    _definitionAt[i] = DeclareDefinition(d, i, line);
                    break;
                case FunctionSyntax fn:
                    if (CanDeclare(fn.Name, fn.NameSpan, LineWithin(i, fn.NameSpan)))
                        _scope.Functions[fn.Name] = new FunctionSymbol(fn, _scope, line);
                    break;
                case ChoiceSyntax c:
                    if (!CanDeclare(c.Name, c.NameSpan, LineWithin(i, c.NameSpan))) break;
                    var type = new ChoiceType(c.Name, _source.Path);
                    _scope.Choices[c.Name] = type;
                    foreach (var (option, span) in c.Options)
                    {
                        if (!CanDeclare(option, span, LineWithin(i, span))) continue;
                        var o = new ChoiceOption(type, option, type.Options.Count);
                        type.Options.Add(o);
                        _scope.Options[option] = o;
                    }
                    break;
                case TableSyntax t:
                    if (CanDeclare(t.Name, t.NameSpan, LineWithin(i, t.NameSpan)))
                        _scope.Tables[t.Name] = new TableSymbol(t, null, _source.Path);
                    break;
                case KindDeclarationSyntax k:
                    var basis = Kinds.Find(k.Base);
                    if (basis is null || basis.Basis is not null)
                    {
                        var candidates = Kinds.Builtin.Select(b => b.Name).Concat(Kinds.Aliases.Keys);
                        _sink.Report(Diagnostic.Error(DiagnosticCodes.UnknownKind, k.BaseSpan, DiagnosticMessages.UnknownKind(k.Base, ExpressionEvaluator.Suggest(k.Base, candidates))));
                        break;
                    }
                    if (CanDeclare(k.Name, k.NameSpan, LineWithin(i, k.NameSpan)))
                        _scope.Kinds[k.Name] = new Kind(k.Name, basis.Dimension, k.Clauses.Description?.Value ?? $"{k.Name.Replace('_', ' ')} (a {basis.Name.Replace('_', ' ')})", isTagged: true, basis: basis);
                    break;
            }
        }
    }

    /// <summary>Declares a definition's name, or reports why not and returns null.</summary>
    private DefinitionSymbol? DeclareDefinition(DefinitionSyntax d, int index, int line)
    {
        // One hash of the name finds an earlier definition and reserves the slot for this one; every
        // refusal below, all errors, gives the slot back. Nothing else touches Definitions meanwhile.
        ref var slot = ref CollectionsMarshal.GetValueRefOrAddDefault(_scope.Definitions, d.Name, out bool defined);
        if (defined)
        {
            int first = _declaredAt.TryGetValue(d.Name, out int otherLine) ? otherLine : slot!.Line;
            _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, d.NameSpan, DiagnosticMessages.Redefinition(d.Name, first + 1)));
            return null;
        }
        if (!CanDeclareOverOthers(d.Name, d.NameSpan))
        {
            _scope.Definitions.Remove(d.Name);
            return null;
        }
        var symbol = new DefinitionSymbol(d, index, line, _source.Path);
        slot = symbol;
        // A name written on a later line than its statement starts keeps its own line, as other names do.
        int nameLine = LineWithin(index, d.NameSpan);
        if (nameLine != line) _declaredAt[d.Name] = nameLine;
        return symbol;
    }

    /// <summary>The line where a name of the sheet was first declared, if it was.</summary>
    private bool TryFirstLine(string name, out int line)
    {
        if (_declaredAt.TryGetValue(name, out line)) return true;
        if (_scope.Definitions.TryGetValue(name, out var definition))
        {
            line = definition.Line;
            return true;
        }
        return false;
    }

    private bool CanDeclare(string name, TextSpan span, int line)
    {
        if (TryFirstLine(name, out int firstLine))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, span, DiagnosticMessages.Redefinition(name, firstLine + 1)));
            return false;
        }
        if (!CanDeclareOverOthers(name, span)) return false;
        _declaredAt[name] = line;
        return true;
    }

    /// <summary>The checks after the sheet's own definitions: its other names, then imports, then built-ins.</summary>
    private bool CanDeclareOverOthers(string name, TextSpan span)
    {
        if (_declaredAt.TryGetValue(name, out int firstLine))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, span, DiagnosticMessages.Redefinition(name, firstLine + 1)));
            return false;
        }
        if (_scope.Imported.TryGetValue(name, out var imported))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportedRedefinition, span, DiagnosticMessages.ImportedRedefinition(name, imported.From.DisplayName)));
            return false;
        }
        if (Builtins.IsBuiltinName(name))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, span, DiagnosticMessages.RedefinitionOfBuiltin(name)));
            return false;
        }
        return true;
    }

    /// <summary>Resolves parameter and return kinds: a kind of quantity, a choice, <c>list</c> or <c>boolean</c>.</summary>
    private void ResolveSignatures()
    {
        foreach (var fn in _scope.Functions.Values)
        {
            var seen = new HashSet<string>(StringComparer.Ordinal);
            foreach (var p in fn.Syntax.Parameters)
            {
                if (!seen.Add(p.Name))
                {
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, p.NameSpan, DiagnosticMessages.Redefinition(p.Name, LineOf(p.Span) + 1)));
                    fn.IsValid = false;
                }
                var (kind, choice, isList, isBoolean) = ResolveKind(p.KindName, p.KindSpan);
                if (kind is null && choice is null && !isList && !isBoolean) fn.IsValid = false;
                fn.Parameters.Add(new ParameterSymbol(p, kind, choice, isList, isBoolean));
            }
            var (rk, rc, rl, rb) = ResolveKind(fn.Syntax.ReturnKind, fn.Syntax.ReturnKindSpan);
            fn.ReturnKind = rk;
            fn.ReturnChoice = rc;
            fn.ReturnsList = rl;
            fn.ReturnsBoolean = rb;
            if (rk is null && rc is null && !rl && !rb) fn.IsValid = false;
        }
        foreach (var table in _scope.Tables.Values)
        {
            var t = table.Syntax;
            var key = _scope.Choices.GetValueOrDefault(t.KeyChoice)
                ?? (_scope.Imported.TryGetValue(t.KeyChoice, out var imp) ? imp.Symbol as ChoiceType : null);
            if (key is null)
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.UnknownKind, t.KeyChoiceSpan, DiagnosticMessages.UnknownChoice(t.KeyChoice,
                    ExpressionEvaluator.Suggest(t.KeyChoice, _scope.Choices.Keys))));
            }
            var declared = new TableSymbol(t, key, _source.Path);
            // Columns are known from the text, so a function can look a table up before its rows are evaluated.
            foreach (var row in t.Clauses.Rows) foreach (var cell in row.Cells) declared.Columns.Add(cell.Column);
            _scope.Tables[t.Name] = declared;
        }
    }

    private (Kind? Kind, ChoiceType? Choice, bool IsList, bool IsBoolean) ResolveKind(string name, TextSpan span)
    {
        if (name == "list") return (null, null, true, false);
        if (name == "boolean") return (null, null, false, true);
        var kind = Kinds.Find(name) ?? _scope.Kinds.GetValueOrDefault(name)
            ?? (_scope.Imported.TryGetValue(name, out var importedKind) ? importedKind.Symbol as Kind : null);
        if (kind is not null) return (kind, null, false, false);
        if (_scope.Choices.TryGetValue(name, out var choice)) return (null, choice, false, false);
        if (_scope.Imported.TryGetValue(name, out var imported) && imported.Symbol is ChoiceType ic) return (null, ic, false, false);
        var candidates = Kinds.Builtin.Select(k => k.Name).Concat(Kinds.Aliases.Keys).Concat(_scope.Choices.Keys).Concat(_scope.Kinds.Keys).Append("list").Append("boolean");
        _sink.Report(Diagnostic.Error(DiagnosticCodes.UnknownKind, span, DiagnosticMessages.UnknownKind(name, ExpressionEvaluator.Suggest(name, candidates))));
        return (null, null, false, false);
    }

    /// <summary>A function may not call itself, directly or through others: evaluation must always end.</summary>
    private void RejectRecursion()
    {
        var calls = new Dictionary<string, HashSet<string>>(StringComparer.Ordinal);
        foreach (var fn in _scope.Functions.Values)
        {
            var names = new HashSet<string>(StringComparer.Ordinal);
            var parameters = fn.Syntax.Parameters.Select(p => p.Name).Concat(fn.Syntax.Clauses.Locals.Select(l => l.Name)).ToHashSet(StringComparer.Ordinal);
            foreach (var e in BodyExpressions(fn.Syntax))
            {
                foreach (var n in NameCollector.Names(e))
                {
                    if (_scope.Functions.ContainsKey(n)) names.Add(n);
                    if (!parameters.Contains(n) && _scope.Definitions.ContainsKey(n)) fn.ReadsSheetDefinitions = true;
                }
            }
            calls[fn.Name] = names;
        }
        foreach (var fn in _scope.Functions.Values)
        {
            // A function that calls one reading the sheet reads it too.
            if (!fn.ReadsSheetDefinitions && Reachable(calls, fn.Name).Any(n => _scope.Functions[n].ReadsSheetDefinitions)) fn.ReadsSheetDefinitions = true;
        }
        foreach (var fn in _scope.Functions.Values)
        {
            var stack = new Stack<string>(calls[fn.Name]);
            var seen = new HashSet<string>(StringComparer.Ordinal);
            while (stack.Count > 0)
            {
                var next = stack.Pop();
                if (next == fn.Name)
                {
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.Recursion, fn.Syntax.NameSpan, DiagnosticMessages.Recursion(fn.Name)));
                    fn.IsValid = false;
                    break;
                }
                if (seen.Add(next)) foreach (var c in calls[next]) stack.Push(c);
            }
        }
    }

    private static IEnumerable<string> Reachable(Dictionary<string, HashSet<string>> calls, string from)
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var stack = new Stack<string>(calls[from]);
        while (stack.Count > 0)
        {
            var next = stack.Pop();
            if (!seen.Add(next)) continue;
            yield return next;
            foreach (var c in calls[next]) stack.Push(c);
        }
    }

    private static IEnumerable<ExpressionSyntax> BodyExpressions(FunctionSyntax fn)
    {
        yield return fn.Body;
        foreach (var p in fn.Parameters) if (p.Default is not null) yield return p.Default;
        foreach (var l in fn.Clauses.Locals) yield return l.Value;
        foreach (var v in fn.Clauses.Valid) yield return v.Condition;
        foreach (var r in fn.Clauses.Require) yield return r.Condition;
        foreach (var c in fn.Clauses.Cautions) yield return c.Condition;
    }

    /// <summary>Checks each function body's dimensions once, with each parameter standing in as 1 of its kind.</summary>
    private void CheckFunctionBodies()
    {
        foreach (var fn in _scope.Functions.Values)
        {
            if (!fn.IsValid) continue;
            var locals = new Dictionary<string, Value>(StringComparer.Ordinal);
            foreach (var p in fn.Parameters)
            {
                locals[p.Name] = p switch
                {
                    { Choice: { } c } => c.Options.Count > 0 ? Value.Of(c.Options[0]) : Value.Unknown,
                    { IsBoolean: true } => Value.Of(true),
                    { IsList: true } => Value.Unknown,
                    { Kind: { } k } => Value.Of(new Quantity(1, k.Dimension, k.IsTagged ? k : null)),
                    _ => Value.Unknown,
                };
            }
            var frame = new EvalFrame { Scope = _scope, Locals = locals, CheckOnly = true, Function = fn, CallSite = fn.Syntax.Span };
            int before = _sink.Diagnostics.Count(d => d.Severity == Severity.Error);
            _currentLine = fn.Line;
            _eval.InvokeBody(fn, fn.Name, null, frame, frame);
            foreach (var caution in fn.Syntax.Clauses.Cautions)
            {
                var m = caution.Message.Value;
                if (m.Length == 0) _sink.Report(Diagnostic.Warning(DiagnosticCodes.IncompleteStatement, caution.Message.Span, DiagnosticMessages.Incomplete("a caution needs a message")));
            }
            if (_sink.Diagnostics.Count(d => d.Severity == Severity.Error) > before) fn.IsValid = false;
        }
    }
}
