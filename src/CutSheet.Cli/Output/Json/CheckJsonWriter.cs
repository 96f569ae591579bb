using System.Text.Json;
using CutSheet.Cli.Commands;
using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Rendering;

namespace CutSheet.Cli.Output.Json;

/// <summary>
/// The JSON output of <c>cutsheet check</c> (schemaVersion 1): one entry per sheet checked, every finding
/// (each once, even when several sheets import the file it is in), and a summary with the exit code.
/// </summary>
internal static class CheckJsonWriter
{
    public static void Write(TextWriter output, CheckRun run) => JsonOutput.Write(output, w => WriteDocument(w, run));

    private static void WriteDocument(Utf8JsonWriter w, CheckRun run)
    {
        w.WriteStartObject();
        JsonFields.WriteHeader(w);
        w.WriteString("failOn", run.FailOn == FailOn.Caution ? "caution" : "error");

        w.WriteStartArray("files");
        foreach (var sheet in run.Sheets)
        {
            var tally = SheetTally.Of(sheet);
            w.WriteStartObject();
            w.WriteString("path", sheet.File.DisplayPath);
            w.WriteString("fullPath", sheet.File.FullPath);
            w.WriteString("workspaceRoot", sheet.WorkspaceRoot);
            w.WriteNumber("errors", tally.Errors);
            w.WriteNumber("warnings", tally.Warnings);
            w.WriteNumber("info", tally.Infos);
            JsonFields.WriteCheckAndCautionCounts(w, tally);
            w.WriteEndObject();
        }
        w.WriteEndArray();

        w.WriteStartArray("findings");
        foreach (var finding in run.Findings) JsonFields.WriteFinding(w, finding);
        w.WriteEndArray();

        var total = run.Tally;
        w.WriteStartObject("summary");
        w.WriteNumber("sheets", total.Sheets);
        w.WriteNumber("errors", total.Errors);
        w.WriteNumber("warnings", total.Warnings);
        w.WriteNumber("info", total.Infos);
        JsonFields.WriteCheckAndCautionCounts(w, total);
        w.WriteNumber("exitCode", run.ExitCode);
        w.WriteEndObject();

        JsonFields.WriteStringOrNull(w, "safetyNotice", total.NeedsSafetyNotice ? SafetyNotice.Text : null);
        w.WriteEndObject();
    }
}
