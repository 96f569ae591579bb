using System.Runtime.InteropServices;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Display;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Evaluates expressions to values, checking dimensions and kinds as it goes: every value of a
/// sheet is known, so one walk both computes and checks. Errors make the value unknown and
/// are reported once; unknown operands propagate quietly. Split over several files by concern.
/// </summary>
internal sealed partial class ExpressionEvaluator
{
    private const int MaxCallDepth = 32;
    private readonly DiagnosticSink _sink;
    private readonly SheetScope _top;
    private readonly Func<int> _currentLine;

    /// <summary>How many products that contain π are being evaluated around the current one.</summary>
    private int _piProducts;
    private readonly SourceText _source;
    private readonly Func<DefinitionSymbol, int> _lastDependencyLine;

    public ExpressionEvaluator(DiagnosticSink sink, SheetScope top, SourceText source, Func<int> currentLine, Func<DefinitionSymbol, int> lastDependencyLine)
    {
        _source = source;
        _lastDependencyLine = lastDependencyLine;
        _sink = sink;
        _top = top;
        _currentLine = currentLine;
    }

    /// <summary>The edit that adds <c>use LIBRARY</c> to the sheet, for the fix offered with an unknown name a library declares.</summary>
    public Func<string, TextEdit>? UseLine { get; init; }

    public Value Evaluate(ExpressionSyntax e, EvalFrame f) => e switch
    {
        QuantityLiteralSyntax q => Literal(q, f),
        NameSyntax n => Name(n, f),
        BinarySyntax b => Binary(b, f),
        UnarySyntax u => Unary(u, f),
        ConvertSyntax c => Convert(c, f),
        CallSyntax c => Call(c, f),
        ConditionalSyntax c => Conditional(c, f),
        ListSyntax l => List(l, f),
        LookupSyntax l => Lookup(l, f),
        BooleanLiteralSyntax b => Value.Of(b.Value),
        _ => Value.Unknown,
    };

    // ----- reporting -----

    private Value Error(EvalFrame f, string code, TextSpan span, string message, Fix? fix = null, IReadOnlyList<RelatedLocation>? related = null)
    {
        if (f.CheckOnly && !code.StartsWith("CUT2", StringComparison.Ordinal) && !code.StartsWith("CUT3", StringComparison.Ordinal)) return Value.Unknown;
        Report(f, code, Severity.Error, span, message, fix is null ? [] : [fix], related);
        return Value.Unknown;
    }

    private void Warn(EvalFrame f, string code, TextSpan span, string message, Fix? fix = null, Severity severity = Severity.Warning) =>
        Warn(f, code, span, message, fix is null ? [] : [fix], severity);

    private void Warn(EvalFrame f, string code, TextSpan span, string message, IReadOnlyList<Fix> fixes, Severity severity = Severity.Warning)
    {
        if (f.CheckOnly && !code.StartsWith("CUT2", StringComparison.Ordinal)) return;
        Report(f, code, severity, span, message, fixes, null);
    }

    private void Report(EvalFrame f, string code, Severity severity, TextSpan span, string message, IReadOnlyList<Fix> fixes, IReadOnlyList<RelatedLocation>? related)
    {
        if (f.Foreign)
        {
            // A problem inside another sheet's function surfaces at the call in this sheet, pointing back.
            var where = new RelatedLocation(span, "in " + (f.Function?.Name ?? "the imported sheet"), f.Scope.Path);
            string prefix = f.Function is null ? "" : f.Function.Name + ": ";
            _sink.Report(new Diagnostic(code, severity, f.CallSite, message.StartsWith(prefix, StringComparison.Ordinal) ? message : prefix + message,
                [where, .. related ?? []], []));
            return;
        }
        _sink.Report(new Diagnostic(code, severity, span, message, related ?? [], fixes));
    }

    // ----- literals and names -----

    private Value Literal(QuantityLiteralSyntax q, EvalFrame f)
    {
        if (q.Unit is null) return Value.Of(new Quantity(q.Number, Dimension.None));
        var facts = UnitFacts.Of(q.Unit);
        var resolution = facts.Resolution;
        if (resolution.Unit is null) return UnitError(q.Unit, resolution.Error!, f);
        var unit = resolution.Unit;
        if (unit.Notes.Count > 0 && !f.CheckOnly && !f.Foreign)
        {
            foreach (var note in unit.Notes) Warn(f, DiagnosticCodes.ShopSpelling, q.Unit.Span, note, severity: Severity.Information);
        }
        if (!f.Foreign && !f.CheckOnly && UnitNamesADefinition(facts))
        {
            foreach (var symbol in facts.Symbols)
            {
                if (!_top.Definitions.ContainsKey(symbol) && !(_top.Imported.TryGetValue(symbol, out var i) && i.Symbol is DefinitionSymbol)) continue;
                var fix = IsWord(q.Unit.Text)
                    ? new Fix($"multiply: {q.NumberText} * {q.Unit.Text}", [new TextEdit(q.Span, $"{q.NumberText} * {q.Unit.Text}")])
                    : null;
                Warn(f, DiagnosticCodes.UnitAlsoName, q.Unit.Span, DiagnosticMessages.UnitAlsoName(symbol), fix);
            }
        }
        return Value.Of(new Quantity(unit.ToSi(q.Number), unit.Dimension, unit.Tag));
    }

    /// <summary>
    /// Per unit, once the sheet's names are settled: whether one of its symbols is also a definition
    /// here (which the literal warns about). A sheet writes the same few units thousands of times.
    /// </summary>
    private Dictionary<UnitFacts, bool>? _unitNamesADefinition;

    /// <summary>Called once the sheet's own and imported names are all declared; from then on they do not change.</summary>
    internal void NamesDeclared() => _unitNamesADefinition = [];

    private bool UnitNamesADefinition(UnitFacts facts)
    {
        if (_unitNamesADefinition is null) return AnySymbolIsADefinition(facts);
        ref bool answer = ref CollectionsMarshal.GetValueRefOrAddDefault(_unitNamesADefinition, facts, out bool known);
        if (!known) answer = AnySymbolIsADefinition(facts);
        return answer;
    }

    private bool AnySymbolIsADefinition(UnitFacts facts)
    {
        foreach (var symbol in facts.Symbols)
        {
            if (_top.Definitions.ContainsKey(symbol) || _top.Imported.TryGetValue(symbol, out var i) && i.Symbol is DefinitionSymbol) return true;
        }
        return false;
    }

    private static bool IsWord(string text)
    {
        foreach (char c in text) if (!(char.IsLetterOrDigit(c) || c == '_')) return false;
        return true;
    }

    private Value UnitError(UnitSyntax unit, UnitError error, EvalFrame f, bool afterAs = false)
    {
        var span = new TextSpan(unit.Span.Start + error.Offset, Math.Max(error.Length, 1));
        if (error.Code == DiagnosticCodes.UnknownUnit)
        {
            string symbol = unit.Text.Substring(Math.Min(error.Offset, unit.Text.Length), Math.Min(error.Length, unit.Text.Length - Math.Min(error.Offset, unit.Text.Length)));
            if (unit.Text == symbol && afterAs && (f.Scope.Find(symbol) is not null || Builtins.Constants.ContainsKey(symbol) || Kinds.Find(symbol) is not null))
            {
                // `x as d_0` or `x as torque`: 'as' takes a unit, and there is nothing to multiply.
                var kind = Kinds.Find(symbol) ?? f.Scope.Kinds.GetValueOrDefault(symbol);
                // A sheet's own kind is shown in the units of the kind it is declared as.
                var shown = kind?.Basis ?? kind;
                string? example = shown is null ? null : DisplayUnits.Choose(1, shown.Dimension, shown.IsTagged ? shown : null, UnitSystem.Metric)?.Text;
                return Error(f, DiagnosticCodes.NameAfterNumber, unit.Span, DiagnosticMessages.NameAfterAs(symbol, kind is not null, example));
            }
            if (unit.Text == symbol && (f.Scope.Find(symbol) is not null || Builtins.Constants.ContainsKey(symbol)))
            {
                return Error(f, DiagnosticCodes.NameAfterNumber, unit.Span, DiagnosticMessages.NameAfterNumber(symbol),
                    new Fix($"write * {symbol}", [new TextEdit(new TextSpan(unit.Span.Start, 0), "* ")]));
            }
            if (error.Suggestion is not null)
            {
                return Error(f, DiagnosticCodes.UnknownUnit, span, DiagnosticMessages.UnknownUnitWithSuggestion(symbol, error.Suggestion),
                    new Fix($"write {error.Suggestion}", [new TextEdit(span, error.Suggestion)]));
            }
        }
        return Error(f, error.Code, span, error.Message);
    }

    private Value Name(NameSyntax n, EvalFrame f)
    {
        if (n.Qualifier is null && f.Locals is not null && f.Locals.TryGetValue(n.Name, out var local)) return local;
        var symbol = ResolveName(n, f, out var error);
        if (symbol is null)
        {
            if (error is not null && !LibraryHint(n, f, DiagnosticCodes.UnknownName)) Error(f, error.Value.Code, n.Span, error.Value.Message);
            return Value.Unknown;
        }
        switch (symbol)
        {
            case DefinitionSymbol d:
                if (!d.Evaluated)
                {
                    if (f.CheckOnly) return Value.Unknown;
                    if (ReferenceEquals(f.Scope, _top) || d.Path == _top.Path) return UsedBeforeDefinition(n, d, f);
                    return Value.Unknown;
                }
                if (f.RecordDependencies && ReferenceEquals(f.Scope, _top)) f.DependsOnSheet = true;
                return d.Value;
            case ChoiceOption o:
                return Value.Of(o);
            case FunctionSymbol fn:
                return Error(f, DiagnosticCodes.TypeMismatch, n.Span, DiagnosticMessages.TypeMismatch("a value", $"the function {fn.Name} (call it with arguments)"));
            case TableSymbol t:
                return Error(f, DiagnosticCodes.TypeMismatch, n.Span, DiagnosticMessages.TypeMismatch("a value", $"the table {t.Name} (look up a cell: {t.Name}[key].column)"));
            case ChoiceType c:
                return Error(f, DiagnosticCodes.TypeMismatch, n.Span, DiagnosticMessages.TypeMismatch("a value", $"the choice {c.Name} (name one of its options)"));
            case Quantity q:
                return Value.Of(q);
        }
        return Value.Unknown;
    }

    /// <summary>Finds what a name means: locals are handled by the caller; then the scope, its imports, and the built-in constants.</summary>
    private object? ResolveName(NameSyntax n, EvalFrame f, out (string Code, string Message)? error)
    {
        error = null;
        var scope = f.Scope;
        if (n.Qualifier is not null)
        {
            if (!scope.Namespaces.TryGetValue(n.Qualifier, out var ns))
            {
                error = (DiagnosticCodes.UnknownName, DiagnosticMessages.UnknownName(n.Qualifier, Suggest(n.Qualifier, scope.Namespaces.Keys)));
                return null;
            }
            var member = ns.FindOwn(n.Name);
            if (member is null) error = (DiagnosticCodes.UnknownName, DiagnosticMessages.UnknownName(n.FullName, Suggest(n.Name, ns.OwnSymbols().Select(s => s.Name))));
            return member;
        }
        var found = scope.Find(n.Name);
        if (found is not null) return found;
        if (Builtins.Constants.TryGetValue(n.Name, out var constant)) return constant;
        error = (DiagnosticCodes.UnknownName, DiagnosticMessages.UnknownName(n.Name, Suggest(n.Name, Candidates(scope, f))));
        return null;
    }

    /// <summary>
    /// The names a mistyped one may have meant. Apart from <see cref="ResolveName"/> on purpose: its
    /// lambda captures a local, and a captured local is allocated whenever the method it lives in
    /// runs, so here it costs only the error path, not every name of every sheet.
    /// </summary>
    private IEnumerable<string> Candidates(SheetScope scope, EvalFrame f)
    {
        // The definition being written is never the name meant: `m = c` does not suggest m.
        int line = _currentLine();
        return scope.OwnSymbols().Where(s => s.Symbol is not DefinitionSymbol { Evaluated: false } d || d.Line != line).Select(s => s.Name)
            .Concat(scope.Imported.Keys).Concat(Builtins.Constants.Keys)
            .Concat(f.Locals?.Keys ?? Enumerable.Empty<string>());
    }

    /// <summary>
    /// A name this sheet does not know but a library sheet declares (<c>backdrive_torque</c> without
    /// <c>use ballscrews</c>): says which library, with a fix that imports it, or that writes the
    /// qualified name when the library is imported under an alias. False when no library has it.
    /// </summary>
    private bool LibraryHint(NameSyntax n, EvalFrame f, string code)
    {
        if (n.Qualifier is not null || f.Foreign || UseLine is null || Library.LibraryIndex.LibraryDeclaring(n.Name) is not { } library) return false;
        foreach (var (alias, ns) in f.Scope.Namespaces)
        {
            if (ns.DisplayName != library || ns.FindOwn(n.Name) is null) continue;
            Error(f, code, n.Span, DiagnosticMessages.ImportedUnderAlias(n.Name, library, alias),
                new Fix(DiagnosticMessages.QualifyFix(alias, n.Name), [new TextEdit(n.Span, alias + "." + n.Name)]));
            return true;
        }
        Error(f, code, n.Span, DiagnosticMessages.InLibrary(n.Name, library), new Fix(DiagnosticMessages.AddUseFix(library), [UseLine(library)]));
        return true;
    }

    /// <summary>
    /// A mistyped function that no name in scope is near, but a function of a library sheet the
    /// sheet does not import is (<c>lead_angel</c> for <c>lead_angle</c> of <c>screws</c>): suggests
    /// it, with a fix that corrects the name and adds the <c>use</c> line.
    /// </summary>
    private bool LibraryFunctionNear(NameSyntax n, EvalFrame f)
    {
        if (n.Qualifier is not null || f.Foreign || UseLine is null) return false;
        var functions = Library.LibraryIndex.All.Where(l => l.Kind == Library.LibraryNameKind.Function);
        if (Suggest(n.Name, functions.Select(l => l.Name)) is not { } near || Library.LibraryIndex.LibraryDeclaring(near) is not { } library) return false;
        if (f.Scope.Namespaces.Values.Any(ns => ns.DisplayName == library)) return false;
        Error(f, DiagnosticCodes.UnknownFunction, n.Span, DiagnosticMessages.UnknownFunctionInLibrary(n.Name, near, library),
            new Fix(DiagnosticMessages.UseLibraryFunctionFix(near, library), [new TextEdit(n.Span, near), UseLine(library)]));
        return true;
    }

    private Value UsedBeforeDefinition(NameSyntax n, DefinitionSymbol d, EvalFrame f)
    {
        int useLine = _currentLine();
        Fix? fix = MoveLineFix.Create(_source, d, useLine, _lastDependencyLine(d));
        return Error(f, DiagnosticCodes.UsedBeforeDefinition, n.Span, DiagnosticMessages.UsedBeforeDefinition(n.Name, useLine + 1, d.Line + 1), fix);
    }

    /// <summary>
    /// The candidate nearest a mistyped name: within a few edits, or else (for names of four or more
    /// letters) the shortest one that starts with it, then the shortest that contains it, then the
    /// longest of six or more letters that it contains: <c>self_locking</c> finds
    /// <c>self_locking_margin</c>, <c>trapezoidal_mean_diameter</c> finds <c>mean_diameter</c>.
    /// A name of one or two letters is only matched in another case (<c>f</c> finds <c>F</c>).
    /// Null when none is near.
    /// </summary>
    internal static string? Suggest(string name, IEnumerable<string> candidates)
    {
        string? best = null, prefixed = null, containing = null, contained = null;
        int bestDistance = int.MaxValue;
        foreach (var c in candidates)
        {
            if (name.Length >= 4 && c.Length > name.Length)
            {
                if (c.StartsWith(name, StringComparison.Ordinal)) { if (prefixed is null || c.Length < prefixed.Length) prefixed = c; }
                else if (c.Contains(name, StringComparison.Ordinal) && (containing is null || c.Length < containing.Length)) containing = c;
            }
            else if (c.Length >= 6 && c.Length < name.Length && name.Contains(c, StringComparison.Ordinal) && (contained is null || c.Length > contained.Length))
            {
                contained = c;
            }
            // A name of one or two letters is an edit away from every other short name: only another case counts.
            if (name.Length < 3)
            {
                if (string.Equals(c, name, StringComparison.OrdinalIgnoreCase)) { bestDistance = 0; best = c; }
                continue;
            }
            if (c.Length > 64 || Math.Abs(c.Length - name.Length) > 3) continue;
            int d = EditDistance.Compute(name.Length > 64 ? name[..64] : name, c);
            if (d < bestDistance) { bestDistance = d; best = c; }
        }
        return bestDistance <= Math.Max(1, name.Length / 3) ? best : prefixed ?? containing ?? contained;
    }

    /// <summary>Words for an operand in messages: the literal as written, a name with its unit, or the SI unit.</summary>
    private string Label(ExpressionSyntax e, Quantity q, EvalFrame f)
    {
        switch (e)
        {
            case QuantityLiteralSyntax lit:
                return lit.Unit is null ? lit.NumberText : lit.NumberText + " " + lit.Unit.Text;
            case NameSyntax n when f.Scope.Find(n.Name) is DefinitionSymbol d && d.DisplayUnit is { } u:
                return $"{n.FullName} in {u.Text}";
            case ConvertSyntax c:
                return c.Unit.Text;
            default:
                var unit = DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, UnitSystem.Metric);
                return unit?.Text ?? "a plain number";
        }
    }
}
