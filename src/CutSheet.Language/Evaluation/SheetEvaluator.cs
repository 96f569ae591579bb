using CutSheet.Language.Diagnostics;
using CutSheet.Language.Display;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Evaluates one sheet: declares its names (imports first), resolves function signatures,
/// rejects recursion, checks every function body's dimensions once, then evaluates the
/// statements top to bottom. Split over several files by stage.
/// </summary>
internal sealed partial class SheetEvaluator
{
    private readonly SheetSyntax _syntax;

    /// <summary>The statements as a list (indexed without an interface call in every stage's loop).</summary>
    private readonly List<StatementSyntax> _statements;
    private readonly SourceText _source;
    private readonly RunOptions _options;
    private readonly ImportContext _imports;
    private readonly IReadOnlyDictionary<string, Value> _importOverrides;
    private readonly DiagnosticSink _sink = new();
    private readonly SheetScope _scope;
    private readonly ExpressionEvaluator _eval;
    private readonly Dictionary<string, string> _metadata = new(StringComparer.Ordinal);
    private readonly List<string> _importNames = [];
    private int _currentLine;
    private DisplaySettings _display;

    private SheetEvaluator(SheetSyntax syntax, RunOptions options, ImportContext imports, IReadOnlyDictionary<string, Value> importOverrides, string displayName)
    {
        _syntax = syntax;
        _statements = syntax.Statements as List<StatementSyntax> ?? [.. syntax.Statements];
        _source = syntax.Source;
        _options = options;
        _imports = imports;
        _importOverrides = importOverrides;
        _scope = new SheetScope(_source.Path, displayName) { SourceText = _source };
        _display = DisplaySettings.Default;
        _eval = new ExpressionEvaluator(_sink, _scope, _source, () => _currentLine, LastDependencyLine) { UseLine = library => Library.UseLineEdit.For(_syntax, library) };
    }

    public static SheetResult Evaluate(SourceText source, RunOptions options, ImportContext imports) =>
        EvaluateScope(source, options, imports, new Dictionary<string, Value>(), source.Path ?? "this sheet").Result;

    public static SheetResult Evaluate(SheetSyntax syntax, RunOptions options, ImportContext imports) =>
        EvaluateScope(syntax, options, imports, new Dictionary<string, Value>(), syntax.Source.Path ?? "this sheet").Result;

    internal static (SheetScope Scope, SheetResult Result) EvaluateScope(SourceText source, RunOptions options, ImportContext imports,
        IReadOnlyDictionary<string, Value> importOverrides, string displayName) =>
        EvaluateScope(SheetSyntax.Parse(source), options, imports, importOverrides, displayName);

    internal static (SheetScope Scope, SheetResult Result) EvaluateScope(SheetSyntax syntax, RunOptions options, ImportContext imports,
        IReadOnlyDictionary<string, Value> importOverrides, string displayName)
    {
        var evaluator = new SheetEvaluator(syntax, options, imports, importOverrides, displayName);
        var result = evaluator.Run();
        return (evaluator._scope, result);
    }

    private SheetResult Run()
    {
        ReadSettings();
        DeclareImports();
        Declare();
        _eval.NamesDeclared();
        ResolveSignatures();
        RejectRecursion();
        CheckFunctionBodies();
        var statements = EvaluateStatements();
        var diagnostics = _syntax.Diagnostics.Concat(_sink.Diagnostics)
            .OrderBy(d => d.Path is null ? 0 : 1).ThenBy(d => d.Span.Start).ThenBy(d => d.Code, StringComparer.Ordinal)
            .ToArray();
        return new SheetResult(_syntax, statements, diagnostics, _metadata, _display, _importNames, _scope);
    }

    private int LineOf(TextSpan span) => _source.GetPosition(span.Start).Line;

    private int LastDependencyLine(DefinitionSymbol d)
    {
        // The dependencies of a definition not yet evaluated: the names its formula mentions.
        int last = -1;
        foreach (var name in NameCollector.Names(d.Syntax.Value))
        {
            if (_scope.Definitions.TryGetValue(name, out var dep) && dep != d) last = Math.Max(last, dep.Line);
        }
        return last;
    }

    private void ReadSettings()
    {
        var units = _options.Units;
        int? digits = _options.Digits;
        var keyLines = new Dictionary<string, int>(StringComparer.Ordinal);
        for (int i = 0; i < _statements.Count; i++)
        {
            var statement = _statements[i];
            switch (statement)
            {
                case SheetMetadataSyntax m:
                    if (keyLines.TryGetValue(m.Key, out int first))
                        _sink.Report(Diagnostic.Warning(DiagnosticCodes.Redefinition, m.KeySpan, DiagnosticMessages.Redefinition("sheet " + m.Key, first + 1)));
                    else
                        keyLines[m.Key] = LineOf(statement.Span);
                    _metadata[m.Key] = m.Value.Value;
                    break;
                case DisplaySyntax d:
                    ReadDisplay(d, ref units, ref digits);
                    break;
            }
        }
        _display = new DisplaySettings(units ?? UnitSystem.Metric, Math.Clamp(digits ?? 4, 1, 15));
    }

    private void ReadDisplay(DisplaySyntax d, ref UnitSystem? units, ref int? digits)
    {
        switch (d.Setting)
        {
            case "units":
                UnitSystem? value = d.Value switch { "metric" => UnitSystem.Metric, "inch" => UnitSystem.Inch, "both" => UnitSystem.Both, _ => null };
                if (value is null) _sink.Report(Diagnostic.Error(DiagnosticCodes.BadSetting, d.ValueSpan, DiagnosticMessages.BadSetting(d.Value, "metric, inch or both")));
                else if (_options.Units is null) units = value;
                break;
            case "digits":
                if (!int.TryParse(d.Value, System.Globalization.NumberStyles.None, System.Globalization.CultureInfo.InvariantCulture, out int n) || n < 1 || n > 15)
                    _sink.Report(Diagnostic.Error(DiagnosticCodes.BadSetting, d.ValueSpan, DiagnosticMessages.BadSetting(d.Value, "a whole number of significant figures from 1 to 15")));
                else if (_options.Digits is null) digits = n;
                break;
            default:
                _sink.Report(Diagnostic.Error(DiagnosticCodes.BadSetting, d.SettingSpan, DiagnosticMessages.BadSetting(d.Setting, "'display units …' or 'display digits …'")));
                break;
        }
    }
}
