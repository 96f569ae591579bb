using CutSheet.Language.Diagnostics;
using CutSheet.Language.Library;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    /// <summary>Loads every <c>use</c>: library sheets by name, workspace sheets by path (confined, no cycles).</summary>
    private void DeclareImports()
    {
        foreach (var statement in _statements)
        {
            // A plain type test: OfType<UseSyntax> tested every statement through the shared generic cast helper.
            if (statement is not UseSyntax use) continue;
            var overrides = new Dictionary<string, Value>(StringComparer.Ordinal);
            var frame = new EvalFrame { Scope = _scope, CallSite = use.Span };
            foreach (var o in use.Overrides) overrides[o.Name] = _eval.Evaluate(o.Value, frame);
            string key;
            SheetSyntax? syntax;
            string path;
            string label;
            if (!use.IsPath)
            {
                syntax = LibrarySheets.Syntax(use.Target);
                path = LibrarySheets.PathOf(use.Target);
                label = use.Target;
                key = "library:" + use.Target;
                if (syntax is null)
                {
                    var suggestion = ExpressionEvaluator.Suggest(use.Target, LibrarySheets.Names);
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan,
                        DiagnosticMessages.LibraryNotFound(use.Target, suggestion, LibrarySheets.Names)));
                    continue;
                }
                _importNames.Add($"{use.Target} (library {LibrarySheets.Version})");
            }
            else
            {
                if (!ResolveWorkspacePath(use, out path)) continue;
                var text = _options.Sources.Read(path);
                label = use.Target;
                key = path;
                if (text is null)
                {
                    _sink.Report(WorkspaceSheetNotFound(use, path));
                    continue;
                }
                syntax = SheetSyntax.Parse(new SourceText(text, path));
                _importNames.Add(path);
            }

            if (_imports.Loading.Contains(key) || key == (_source.Path ?? ""))
            {
                var chain = string.Join(" → ", _imports.Loading.Select(Path.GetFileName).Append(Path.GetFileName(_source.Path ?? "this sheet")).Append(label));
                _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportCycle, use.TargetSpan, DiagnosticMessages.ImportCycle(chain)));
                continue;
            }
            if (_imports.Loading.Count >= ImportContext.MaxDepth)
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.LimitExceeded, use.TargetSpan, DiagnosticMessages.LimitExceeded($"imports nested more than {ImportContext.MaxDepth} deep")));
                continue;
            }

            string cacheKey = key + "|" + string.Join(";", use.Overrides.Select(o => o.Name + "=" + _source.Slice(o.Value.Span)));
            if (!_imports.Cache.TryGetValue(cacheKey, out var loaded))
            {
                loaded = !use.IsPath && use.Overrides.Count == 0
                    ? LibraryScopes.Get(use.Target, syntax, _options)
                    : Load(syntax, overrides, label);
                _imports.Cache[cacheKey] = loaded;
            }
            var (scope, result) = loaded;
            foreach (var o in use.Overrides)
            {
                if (!scope.Definitions.TryGetValue(o.Name, out var target))
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideNotInput, o.NameSpan, DiagnosticMessages.OverrideUnknown(o.Name, label,
                        ExpressionEvaluator.Suggest(o.Name, scope.Definitions.Values.Where(d => d.IsInput).Select(d => d.Name)))));
                else if (!target.IsInput)
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideNotInput, o.NameSpan, DiagnosticMessages.OverrideNotInput(o.Name, label)));
                else if (scope.RefusedOverrides.TryGetValue(o.Name, out var refused))
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideMismatch, o.Value.Span, refused));
            }
            int errors = result.Diagnostics.Count(d => d.Severity == Severity.Error);
            // A refused override leaves its input unknown, and the imported sheet's checks on it "not
            // evaluated": those follow from the refusal just reported, which is the one to fix.
            if (errors > 0 && scope.RefusedOverrides.Count == 0)
            {
                // Point at the cause: through imports of imports, down to the first real error.
                var first = result.Diagnostics.First(d => d.Severity == Severity.Error);
                var cause = first.Code == DiagnosticCodes.ImportHasErrors && first.Related.Count > 0
                    ? first.Related[0]
                    : new RelatedLocation(first.Span, first.Message, first.Path ?? path);
                _sink.Report(new Diagnostic(DiagnosticCodes.ImportHasErrors, Severity.Error, use.TargetSpan,
                    DiagnosticMessages.ImportHasErrors(label, errors) + "; first: " + cause.Message, [cause], []));
            }
            Register(use, scope, label);
        }
    }

    /// <summary>
    /// A quoted path that names no file: when it is a library's name (<c>use "screws"</c>) or lacks
    /// the extension of a sheet that exists (<c>use "axis"</c>), says so with the fix.
    /// </summary>
    private Diagnostic WorkspaceSheetNotFound(UseSyntax use, string path)
    {
        if (LibrarySheets.Names.Contains(use.Target))
            return Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan, DiagnosticMessages.LibraryQuoted(use.Target),
                new Fix($"write use {use.Target}", [new TextEdit(use.TargetSpan, use.Target)]));
        if (!use.Target.EndsWith(".cutsheet", StringComparison.Ordinal) && _options.Sources.Read(path + ".cutsheet") is not null)
            return Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan, DiagnosticMessages.ImportWithoutExtension(use.Target),
                new Fix($"write \"{use.Target}.cutsheet\"", [new TextEdit(use.TargetSpan, $"\"{use.Target}.cutsheet\"")]));
        return Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan, DiagnosticMessages.ImportNotFound(use.Target));
    }

    /// <summary>Evaluates an imported sheet in this run's import context (workspace sheets, and library sheets with overrides).</summary>
    private (SheetScope Scope, SheetResult Result) Load(SheetSyntax syntax, IReadOnlyDictionary<string, Value> overrides, string label)
    {
        _imports.Loading.Add(_source.Path ?? "");
        try
        {
            var importOptions = _options with { Overrides = new Dictionary<string, string>() };
            return EvaluateScope(syntax, importOptions, _imports, overrides, label);
        }
        finally
        {
            _imports.Loading.RemoveAt(_imports.Loading.Count - 1);
        }
    }

    private void Register(UseSyntax use, SheetScope scope, string label)
    {
        if (use.Alias is not null)
        {
            if (_scope.Namespaces.ContainsKey(use.Alias))
                _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportClash, use.AliasSpan, DiagnosticMessages.ImportClash(use.Alias, _scope.Namespaces[use.Alias].DisplayName, label)));
            else
                _scope.Namespaces[use.Alias] = scope;
            return;
        }
        foreach (var (name, symbol) in scope.OwnSymbols())
        {
            if (_scope.Imported.TryGetValue(name, out var existing) && !ReferenceEquals(existing.Symbol, symbol))
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportClash, use.TargetSpan, DiagnosticMessages.ImportClash(name, existing.From.DisplayName, label)));
                continue;
            }
            _scope.Imported[name] = (symbol, scope);
        }
    }

    private bool ResolveWorkspacePath(UseSyntax use, out string path)
    {
        path = "";
        string? baseDir = _source.Path is { } p && !p.StartsWith("library/", StringComparison.Ordinal) ? Path.GetDirectoryName(p) : _options.WorkspaceRoot;
        if (baseDir is null)
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan, DiagnosticMessages.ImportNotFound(use.Target)));
            return false;
        }
        try
        {
            path = Path.GetFullPath(Path.Combine(baseDir, use.Target));
        }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportNotFound, use.TargetSpan, DiagnosticMessages.ImportNotFound(use.Target)));
            return false;
        }
        string root = _options.Sources.ResolveLinks(Path.GetFullPath(_options.WorkspaceRoot ?? baseDir));
        string resolved = _options.Sources.ResolveLinks(path);
        string rootWithSep = root.EndsWith(Path.DirectorySeparatorChar) ? root : root + Path.DirectorySeparatorChar;
        if (!resolved.StartsWith(rootWithSep, StringComparison.Ordinal))
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.ImportOutsideWorkspace, use.TargetSpan, DiagnosticMessages.ImportOutsideWorkspace(use.Target)));
            return false;
        }
        return true;
    }
}
