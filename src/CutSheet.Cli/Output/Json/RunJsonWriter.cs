using System.Text.Json;
using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Rendering;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Output.Json;

/// <summary>
/// The JSON output of <c>cutsheet run</c> (schemaVersion 1): the file, the settings the results were shown
/// with, every statement in order, the checks, the diagnostics and a summary with the exit code.
/// </summary>
internal static class RunJsonWriter
{
    public static void Write(TextWriter output, SheetEvaluation evaluation, SheetTally tally, int exitCode) =>
        JsonOutput.Write(output, w => WriteDocument(w, evaluation, tally, exitCode));

    private static void WriteDocument(Utf8JsonWriter w, SheetEvaluation evaluation, SheetTally tally, int exitCode)
    {
        var result = evaluation.Result;
        w.WriteStartObject();
        JsonFields.WriteHeader(w);
        w.WriteString("path", evaluation.File.DisplayPath);
        w.WriteString("fullPath", evaluation.File.FullPath);
        w.WriteString("workspaceRoot", evaluation.WorkspaceRoot);

        w.WriteStartObject("metadata");
        foreach (var (key, value) in result.Metadata.OrderBy(m => m.Key, StringComparer.Ordinal)) w.WriteString(key, value);
        w.WriteEndObject();

        w.WriteStartObject("display");
        w.WriteString("units", result.Display.Units.ToString().ToLowerInvariant());
        w.WriteNumber("digits", result.Display.Digits);
        w.WriteEndObject();

        w.WriteStartObject("overrides");
        foreach (var (name, value) in evaluation.Overrides.OrderBy(o => o.Key, StringComparer.Ordinal)) w.WriteString(name, value);
        w.WriteEndObject();

        w.WriteStartArray("imports");
        foreach (string import in result.Imports) w.WriteStringValue(import);
        w.WriteEndArray();

        w.WriteStartArray("statements");
        foreach (var statement in result.Statements) WriteStatement(w, statement, evaluation);
        w.WriteEndArray();

        w.WriteStartArray("checks");
        foreach (var check in result.Checks) WriteCheck(w, check, CheckExpression.Of(result, check));
        w.WriteEndArray();

        w.WriteStartArray("diagnostics");
        foreach (var finding in evaluation.Findings) JsonFields.WriteFinding(w, finding);
        w.WriteEndArray();

        w.WriteStartObject("summary");
        w.WriteNumber("errors", tally.Errors);
        w.WriteNumber("warnings", tally.Warnings);
        w.WriteNumber("info", tally.Infos);
        JsonFields.WriteCheckAndCautionCounts(w, tally);
        w.WriteNumber("exitCode", exitCode);
        w.WriteEndObject();

        JsonFields.WriteStringOrNull(w, "safetyNotice", tally.NeedsSafetyNotice ? SafetyNotice.Text : null);
        w.WriteEndObject();
    }

    private static void WriteStatement(Utf8JsonWriter w, StatementResult statement, SheetEvaluation evaluation)
    {
        w.WriteStartObject();
        w.WriteString("kind", StatementKinds.Of(statement));
        w.WriteNumber("line", statement.Line + 1);
        switch (statement)
        {
            case HeadingResult h:
                w.WriteNumber("level", h.Heading.Level);
                w.WriteString("text", h.Heading.Text);
                break;
            case DefinitionResult d:
                w.WriteString("name", d.Name);
                JsonFields.WriteValue(w, "value", d.Value);
                JsonFields.WriteStringOrNull(w, "quantityKind", d.Kind);
                w.WriteBoolean("isInput", d.IsInput);
                w.WriteBoolean("assumed", d.IsAssumed);
                w.WriteBoolean("overridden", d.IsOverridden);
                JsonFields.WriteStringOrNull(w, "source", d.Source);
                JsonFields.WriteStringOrNull(w, "description", d.Description);
                break;
            case CheckResult c:
                w.WriteString("expression", CheckExpression.Of(evaluation.Result, c));
                w.WriteString("text", c.Text);
                w.WriteString("status", StatementKinds.Status(c.Status));
                break;
            case CautionStatementResult c:
                w.WriteString("level", StatementKinds.Level(c.Caution.Level));
                w.WriteString("message", c.Caution.Message.Value);
                if (c.Fired is { } fired) w.WriteBoolean("fired", fired);
                else w.WriteNull("fired");
                break;
        }
        w.WriteStartArray("cautions");
        foreach (var caution in statement.Cautions) WriteCaution(w, caution, evaluation);
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteCaution(Utf8JsonWriter w, CautionResult caution, SheetEvaluation evaluation)
    {
        w.WriteStartObject();
        w.WriteString("level", StatementKinds.Level(caution.Level));
        w.WriteString("message", caution.Message);
        w.WriteBoolean("accepted", caution.IsAccepted);
        JsonFields.WriteStringOrNull(w, "acceptedReason", caution.AcceptedReason);
        JsonFields.WriteStringOrNull(w, "origin", caution.Origin);
        JsonFields.WriteRange(w, evaluation.Locations.Resolve(null, caution.Span));
        w.WriteEndObject();
    }

    private static void WriteCheck(Utf8JsonWriter w, CheckResult check, string expression)
    {
        w.WriteStartObject();
        w.WriteNumber("line", check.Line + 1);
        w.WriteString("expression", expression);
        w.WriteString("text", check.Text);
        w.WriteString("status", StatementKinds.Status(check.Status));
        w.WriteString("operator", check.Operator);
        JsonFields.WriteValue(w, "value", check.Value);
        JsonFields.WriteValue(w, "limit", check.Limit);
        JsonFields.WriteNumber(w, "utilisation", check.Utilisation);
        JsonFields.WriteValue(w, "margin", check.Margin);
        JsonFields.WriteStringOrNull(w, "description", check.Description);
        w.WriteEndObject();
    }
}
