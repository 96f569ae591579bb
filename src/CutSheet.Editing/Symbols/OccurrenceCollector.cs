using CutSheet.Editing.Analysis;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Symbols;

/// <summary>
/// Walks a sheet's syntax and names every occurrence: declarations, references in formulas,
/// named arguments (they refer to the callee's parameter), kinds, choice options, table keys,
/// import aliases. Names resolve as the evaluator resolves them: a function's parameters and
/// <c>where</c> locals first, then the sheet's own names, then unqualified imports, then built-ins.
/// </summary>
internal sealed class OccurrenceCollector(SheetAnalysis analysis)
{
    private readonly List<SymbolOccurrence> _found = [];
    private readonly SheetScope _scope = analysis.Result.Scope;
    private readonly string? _path = analysis.Path;
    private readonly Dictionary<string, UseSyntax> _aliases = new(StringComparer.Ordinal);

    public List<SymbolOccurrence> Collect()
    {
        foreach (var use in analysis.Result.Syntax.Statements.OfType<UseSyntax>())
            if (use.Alias is not null) _aliases.TryAdd(use.Alias, use);
        foreach (var statement in analysis.Result.Syntax.Statements) Statement(statement);
        return _found;
    }

    private void Statement(StatementSyntax statement)
    {
        switch (statement)
        {
            case DefinitionSyntax d:
                Declare(d.NameSpan, Own(d.Name, SymbolCategory.Definition, d.NameSpan, _scope.Definitions.GetValueOrDefault(d.Name)));
                Expression(d.Value, null);
                break;
            case FunctionSyntax f:
                Function(f);
                break;
            case CheckSyntax c:
                Expression(c.Condition, null);
                if (c.Tolerance is not null) Expression(c.Tolerance, null);
                break;
            case CautionSyntax c:
                Expression(c.Condition, null);
                break;
            case UseSyntax u:
                Use(u);
                break;
            case ChoiceSyntax c:
                Declare(c.NameSpan, Own(c.Name, SymbolCategory.Choice, c.NameSpan, _scope.Choices.GetValueOrDefault(c.Name)));
                foreach (var (name, span) in c.Options)
                    Declare(span, Own(name, SymbolCategory.Option, span, _scope.Options.GetValueOrDefault(name)));
                break;
            case TableSyntax t:
                Declare(t.NameSpan, Own(t.Name, SymbolCategory.Table, t.NameSpan, _scope.Tables.GetValueOrDefault(t.Name)));
                KindOrChoice(t.KeyChoice, t.KeyChoiceSpan);
                foreach (var row in t.Clauses.Rows)
                {
                    Reference(row.KeySpan, Resolve(row.Key, null));
                    foreach (var cell in row.Cells)
                    {
                        Expression(cell.Value, null);
                        if (cell.Low is not null) Expression(cell.Low, null);
                        if (cell.High is not null) Expression(cell.High, null);
                    }
                }
                break;
            case KindDeclarationSyntax k:
                Declare(k.NameSpan, Own(k.Name, SymbolCategory.Kind, k.NameSpan, _scope.Kinds.GetValueOrDefault(k.Name)));
                KindOrChoice(k.Base, k.BaseSpan);
                break;
        }
    }

    private void Function(FunctionSyntax f)
    {
        Declare(f.NameSpan, Own(f.Name, SymbolCategory.Function, f.NameSpan, _scope.Functions.GetValueOrDefault(f.Name)));
        var locals = new Dictionary<string, SymbolTarget>(StringComparer.Ordinal);
        foreach (var p in f.Parameters)
        {
            var target = Own(p.Name, SymbolCategory.Parameter, p.NameSpan, null);
            locals.TryAdd(p.Name, target);
            Declare(p.NameSpan, target);
            KindOrChoice(p.KindName, p.KindSpan);
        }
        KindOrChoice(f.ReturnKind, f.ReturnKindSpan);
        foreach (var local in f.Clauses.Locals)
        {
            var target = Own(local.Name, SymbolCategory.Local, local.NameSpan, null);
            locals.TryAdd(local.Name, target);
            Declare(local.NameSpan, target);
        }
        foreach (var p in f.Parameters)
            if (p.Default is not null) Expression(p.Default, locals);
        Expression(f.Body, locals);
        foreach (var local in f.Clauses.Locals) Expression(local.Value, locals);
        foreach (var c in f.Clauses.Valid.Concat(f.Clauses.Require)) Expression(c.Condition, locals);
        foreach (var c in f.Clauses.Cautions) Expression(c.Condition, locals);
    }

    private void Use(UseSyntax u)
    {
        string? sheetPath = u.IsPath
            ? (_path is null ? null : SafeCombine(System.IO.Path.GetDirectoryName(_path), u.Target))
            : Language.Library.LibrarySheets.PathOf(u.Target);
        if (sheetPath is not null) Reference(u.TargetSpan, new SymbolTarget(u.Target, SymbolCategory.Sheet, sheetPath, default));
        SheetScope? imported = null;
        if (u.Alias is not null)
        {
            Declare(u.AliasSpan, Own(u.Alias, SymbolCategory.Namespace, u.AliasSpan, null));
            imported = _scope.Namespaces.GetValueOrDefault(u.Alias);
        }
        foreach (var o in u.Overrides)
        {
            object? symbol = imported is not null
                ? imported.Definitions.GetValueOrDefault(o.Name)
                : _scope.Imported.TryGetValue(o.Name, out var i) ? i.Symbol : null;
            if (symbol is DefinitionSymbol d) Reference(o.NameSpan, TargetOf(d, null));
            Expression(o.Value, null);
        }
    }

    private static string? SafeCombine(string? directory, string relative)
    {
        if (directory is null) return null;
        try { return System.IO.Path.GetFullPath(System.IO.Path.Combine(directory, relative)); }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException) { return null; }
    }

    private void Expression(ExpressionSyntax root, Dictionary<string, SymbolTarget>? locals)
    {
        var stack = new Stack<ExpressionSyntax>();
        stack.Push(root);
        while (stack.Count > 0)
        {
            switch (stack.Pop())
            {
                case NameSyntax n:
                    Name(n, locals);
                    break;
                case BinarySyntax b: stack.Push(b.Left); stack.Push(b.Right); break;
                case UnarySyntax u: stack.Push(u.Operand); break;
                case ConvertSyntax c: stack.Push(c.Operand); break;
                case ConditionalSyntax c: stack.Push(c.Condition); stack.Push(c.Then); stack.Push(c.Else); break;
                case ListSyntax l: foreach (var i in l.Items) stack.Push(i); break;
                case CallSyntax c:
                    var callee = Name(c.Callee, locals);
                    foreach (var a in c.Arguments)
                    {
                        if (a.Name is not null && callee?.Symbol is FunctionSymbol fs
                            && fs.Syntax.Parameters.FirstOrDefault(p => p.Name == a.Name) is { } parameter)
                            Reference(a.NameSpan, new SymbolTarget(parameter.Name, SymbolCategory.Parameter, fs.Home.Path, parameter.NameSpan) { HomeText = fs.Home.SourceText ?? TextOf(null, fs.Home.Path) });
                        stack.Push(a.Value);
                    }
                    break;
                case LookupSyntax l:
                    Name(l.Table, locals);
                    stack.Push(l.Key);
                    break;
            }
        }
    }

    private SymbolTarget? Name(NameSyntax n, Dictionary<string, SymbolTarget>? locals)
    {
        SymbolTarget? target;
        if (n.Qualifier is not null)
        {
            if (_aliases.TryGetValue(n.Qualifier, out var use))
                Reference(n.QualifierSpan, Own(use.Alias!, SymbolCategory.Namespace, use.AliasSpan, null));
            var ns = _scope.Namespaces.GetValueOrDefault(n.Qualifier);
            target = ns?.FindOwn(n.Name) is { } symbol ? TargetOf(symbol, ns) : null;
        }
        else
        {
            target = Resolve(n.Name, locals);
        }
        Reference(n.NameSpan, target);
        return target;
    }

    private SymbolTarget? Resolve(string name, Dictionary<string, SymbolTarget>? locals)
    {
        if (locals is not null && locals.TryGetValue(name, out var local)) return local;
        if (_scope.FindOwn(name) is { } own) return TargetOf(own, _scope);
        if (_scope.Imported.TryGetValue(name, out var imported)) return TargetOf(imported.Symbol, imported.From);
        if (BuiltinCatalog.Constants.ContainsKey(name)) return new SymbolTarget(name, SymbolCategory.BuiltinConstant, null, default);
        if (BuiltinCatalog.Functions.Any(f => f.Name == name)) return new SymbolTarget(name, SymbolCategory.BuiltinFunction, null, default);
        return null;
    }

    private void KindOrChoice(string name, TextSpan span)
    {
        if (span.Length == 0) return;
        object? symbol = _scope.Kinds.GetValueOrDefault(name) ?? (object?)_scope.Choices.GetValueOrDefault(name);
        if (symbol is not null) { Reference(span, TargetOf(symbol, _scope)); return; }
        if (_scope.Imported.TryGetValue(name, out var imported) && imported.Symbol is Kind or ChoiceType)
        {
            Reference(span, TargetOf(imported.Symbol, imported.From));
            return;
        }
        if (Kinds.Find(name) is not null) Reference(span, new SymbolTarget(name, SymbolCategory.BuiltinKind, null, default));
    }

    /// <summary>The declaration of a symbol of the language, in the sheet it belongs to.</summary>
    private SymbolTarget? TargetOf(object symbol, SheetScope? home) => symbol switch
    {
        DefinitionSymbol d => new SymbolTarget(d.Name, SymbolCategory.Definition, d.Path, d.Syntax.NameSpan, d) { HomeText = TextOf(home, d.Path) },
        FunctionSymbol f => new SymbolTarget(f.Name, SymbolCategory.Function, f.Home.Path, f.Syntax.NameSpan, f) { HomeText = f.Home.SourceText ?? TextOf(null, f.Home.Path) },
        TableSymbol t => new SymbolTarget(t.Name, SymbolCategory.Table, t.Path, t.Syntax.NameSpan, t) { HomeText = TextOf(home, t.Path) },
        ChoiceType c => DeclarationFinder.Choice(home ?? _scope, c),
        ChoiceOption o => DeclarationFinder.Option(home ?? _scope, o),
        Kind k => DeclarationFinder.Kind(home ?? _scope, k),
        _ => null,
    };

    /// <summary>The text a symbol's spans refer to: this sheet's, or the importing scope's copy of the other sheet.</summary>
    private SourceText? TextOf(SheetScope? home, string? path) =>
        path == _path ? analysis.Source : home?.SourceText;

    private SymbolTarget Own(string name, SymbolCategory category, TextSpan span, object? symbol) =>
        new(name, category, _path, span, symbol) { HomeText = analysis.Source };

    private void Declare(TextSpan span, SymbolTarget target)
    {
        if (span.Length > 0) _found.Add(new SymbolOccurrence(span, target, IsDeclaration: true));
    }

    private void Reference(TextSpan span, SymbolTarget? target)
    {
        if (target is not null && span.Length > 0) _found.Add(new SymbolOccurrence(span, target, IsDeclaration: false));
    }
}
