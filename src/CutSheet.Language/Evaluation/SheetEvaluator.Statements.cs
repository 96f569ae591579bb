using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    private List<StatementResult> EvaluateStatements()
    {
        var results = new List<StatementResult>(_statements.Count);
        var overrides = ParseOverrides();
        for (int i = 0; i < _statements.Count; i++)
        {
            var statement = _statements[i];
            int line = _statementLines[i];
            _currentLine = line;
            _sink.BeginStatement();
            CheckClauses(statement);
            StatementResult result = statement switch
            {
                DefinitionSyntax d => EvaluateDefinition(d, line, _definitionAt[i], overrides),
                CheckSyntax c => EvaluateCheck(c, line),
                CautionSyntax c => EvaluateCaution(c, line),
                TableSyntax t => EvaluateTable(t, line),
                HeadingSyntax h => new HeadingResult(h, line),
                _ => new OtherStatementResult(statement, line),
            };
            var cautions = FinishCautions(statement);
            results.Add(cautions.Count == 0 ? result : result with { Cautions = cautions });
        }
        foreach (var name in overrides.Keys)
        {
            if (!_scope.Definitions.ContainsKey(name))
                _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideNotInput, new TextSpan(0, 0), DiagnosticMessages.SetUnknown(name, InputNear(name))));
        }
        return results;
    }

    /// <summary>The sheet's input whose name is nearest to a mistyped one, for the suggestion.</summary>
    private string? InputNear(string name) => ExpressionEvaluator.Suggest(name, _scope.Definitions.Values.Where(d => d.IsInput).Select(d => d.Name));

    /// <summary>Turns the cautions the statement fired into results and diagnostics, honouring <c>accepted</c>.</summary>
    private IReadOnlyList<CautionResult> FinishCautions(StatementSyntax statement)
    {
        var accepted = statement.Clauses.Accepted;
        if (_sink.Cautions.Count == 0)
        {
            if (accepted is not null && statement is DefinitionSyntax or CheckSyntax or CautionSyntax)
                _sink.Report(Diagnostic.Warning(DiagnosticCodes.NothingToAccept, accepted.Span, DiagnosticMessages.NothingToAccept));
            return [];
        }
        var list = new List<CautionResult>(_sink.Cautions.Count);
        foreach (var c in _sink.Cautions)
        {
            var result = accepted is null ? c : c with { AcceptedReason = accepted.Value };
            list.Add(result);
            _sink.Report(CautionDiagnostics.For(result));
        }
        return list;
    }

    private void CheckClauses(StatementSyntax statement)
    {
        var clauses = statement.Clauses;
        // Most statements share the empty clauses: no need to look further.
        if (ReferenceEquals(clauses, ClausesSyntax.Empty) || clauses.Keywords.Count == 0) return;
        string[] allowed = statement switch
        {
            DefinitionSyntax => ["assumed", "source", "accepted"],
            FunctionSyntax => ["source", "where", "valid", "require", "caution"],
            CheckSyntax => ["source", "accepted"],
            CautionSyntax => ["source", "accepted"],
            TableSyntax => ["source", "row"],
            ChoiceSyntax => ["source"],
            KindDeclarationSyntax => ["source"],
            _ => [],
        };
        foreach (var (keyword, span) in clauses.Keywords)
        {
            if (Array.IndexOf(allowed, keyword) < 0)
            {
                string what = statement switch
                {
                    DefinitionSyntax => "a definition",
                    FunctionSyntax => "a function",
                    CheckSyntax => "a check",
                    CautionSyntax => "a caution",
                    TableSyntax => "a table",
                    ChoiceSyntax => "a choice",
                    KindDeclarationSyntax => "a kind declaration",
                    UseSyntax => "an import",
                    _ => "this statement",
                };
                _sink.Report(Diagnostic.Error(DiagnosticCodes.ClauseNotAllowed, span, DiagnosticMessages.ClauseNotAllowed(keyword, what)));
            }
        }
    }

    /// <summary>Parses <c>--set NAME=VALUE</c> expressions once, as if written <c>NAME = VALUE</c>.</summary>
    private Dictionary<string, (SheetSyntax Syntax, DefinitionSyntax Definition)> ParseOverrides()
    {
        var result = new Dictionary<string, (SheetSyntax, DefinitionSyntax)>(StringComparer.Ordinal);
        foreach (var (name, text) in _options.Overrides)
        {
            var syntax = SheetSyntax.Parse($"{name} = {text}", "--set " + name);
            if (syntax.Statements.Count == 1 && syntax.Statements[0] is DefinitionSyntax d && syntax.Diagnostics.Count == 0)
            {
                result[name] = (syntax, d);
            }
            else
            {
                string message = syntax.Diagnostics.Count > 0 ? syntax.Diagnostics[0].Message : DiagnosticMessages.NotAStatement;
                _sink.Report(Diagnostic.Error(DiagnosticCodes.OverrideNotInput, new TextSpan(0, 0), $"--set {name}={text}: {message}"));
            }
        }
        return result;
    }

    private StatementResult EvaluateTable(TableSyntax t, int line)
    {
        if (!_scope.Tables.TryGetValue(t.Name, out var table) || table.Syntax != t) return new OtherStatementResult(t, line);
        var frame = StatementFrame(t.Span);
        var rowLines = new Dictionary<string, int>(StringComparer.Ordinal);
        foreach (var row in t.Clauses.Rows)
        {
            if (table.Key is not null && !table.Key.Options.Exists(o => o.Name == row.Key))
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.UnknownChoiceValue, row.KeySpan, DiagnosticMessages.UnknownChoiceValue(row.Key, table.Key.Name)));
                continue;
            }
            if (rowLines.TryGetValue(row.Key, out int firstRow))
            {
                _sink.Report(Diagnostic.Error(DiagnosticCodes.Redefinition, row.KeySpan, DiagnosticMessages.Redefinition(row.Key, firstRow + 1)));
                continue;
            }
            rowLines[row.Key] = LineOf(row.Span);
            var cells = new Dictionary<string, TableCell>(StringComparer.Ordinal);
            foreach (var cell in row.Cells)
            {
                var typical = _eval.Evaluate(cell.Value, frame);
                var low = cell.Low is null ? typical : _eval.Evaluate(cell.Low, frame);
                var high = cell.High is null ? typical : _eval.Evaluate(cell.High, frame);
                cells[cell.Column] = new TableCell(typical, low, high);
                table.Columns.Add(cell.Column);
            }
            table.Rows[row.Key] = (cells, row.Source?.Value ?? t.Clauses.Source?.Value);
        }
        return new OtherStatementResult(t, line);
    }

    private StatementResult EvaluateCaution(CautionSyntax c, int line)
    {
        var frame = StatementFrame(c.Span);
        var v = _eval.Evaluate(c.Condition, frame);
        bool? fired = null;
        if (v.Kind == ValueKind.Boolean)
        {
            fired = v.Boolean;
            if (v.Boolean) _sink.Cautions.Add(new CautionResult(c.Level, c.Message.Value, c.Span, null, null));
        }
        else if (!v.IsUnknown)
        {
            _sink.Report(Diagnostic.Error(DiagnosticCodes.TypeMismatch, c.Condition.Span, DiagnosticMessages.TypeMismatch("a condition (true or false)", v.Describe())));
        }
        return new CautionStatementResult(c, line, fired);
    }
}
