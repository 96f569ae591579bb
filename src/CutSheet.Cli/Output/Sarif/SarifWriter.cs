using System.Text.Json;
using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Output.Json;

namespace CutSheet.Cli.Output.Sarif;

/// <summary>
/// The SARIF 2.1.0 output of <c>cutsheet check</c>: one run, a rule per diagnostic code seen, one result per
/// finding. Columns are UTF-16 code units (<c>columnKind</c> says so); artifact URIs are relative to the
/// working directory, declared as <c>%SRCROOT%</c>, with forward slashes.
/// </summary>
internal static class SarifWriter
{
    public const string SchemaUri = "https://json.schemastore.org/sarif-2.1.0.json";
    public const string SarifVersion = "2.1.0";
    public const string RootBaseId = "%SRCROOT%";

    public static void Write(TextWriter output, CheckRun run) => JsonOutput.Write(output, w => WriteLog(w, run));

    private static void WriteLog(Utf8JsonWriter w, CheckRun run)
    {
        var ruleIds = run.Findings.Select(f => f.Code).Distinct(StringComparer.Ordinal).Order(StringComparer.Ordinal).ToList();
        var ruleIndex = ruleIds.Select((id, i) => (id, i)).ToDictionary(p => p.id, p => p.i, StringComparer.Ordinal);

        w.WriteStartObject();
        w.WriteString("$schema", SchemaUri);
        w.WriteString("version", SarifVersion);
        w.WriteStartArray("runs");
        w.WriteStartObject();

        w.WriteStartObject("tool");
        w.WriteStartObject("driver");
        w.WriteString("name", ToolInfo.Name);
        w.WriteString("version", ToolInfo.Version);
        w.WriteString("semanticVersion", ToolInfo.Version);
        w.WriteString("informationUri", ToolInfo.InformationUri);
        w.WriteStartArray("rules");
        foreach (string id in ruleIds)
        {
            w.WriteStartObject();
            w.WriteString("id", id);
            w.WriteStartObject("shortDescription");
            w.WriteString("text", RuleDescriptions.Describe(id));
            w.WriteEndObject();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
        w.WriteEndObject();

        w.WriteStartObject("originalUriBaseIds");
        w.WriteStartObject(RootBaseId);
        w.WriteString("uri", DirectoryUri(run.WorkingDirectory));
        w.WriteEndObject();
        w.WriteEndObject();

        w.WriteString("columnKind", "utf16CodeUnits");

        w.WriteStartArray("results");
        foreach (var finding in run.Findings) WriteResult(w, finding, ruleIndex[finding.Code], run.WorkingDirectory);
        w.WriteEndArray();

        w.WriteEndObject();
        w.WriteEndArray();
        w.WriteEndObject();
    }

    private static void WriteResult(Utf8JsonWriter w, Finding finding, int ruleIndex, string workingDirectory)
    {
        w.WriteStartObject();
        w.WriteString("ruleId", finding.Code);
        w.WriteNumber("ruleIndex", ruleIndex);
        w.WriteString("level", SeverityNames.SarifLevel(finding.Severity));
        w.WriteStartObject("message");
        w.WriteString("text", finding.Message);
        w.WriteEndObject();
        w.WriteStartArray("locations");
        w.WriteStartObject();
        w.WriteStartObject("physicalLocation");
        w.WriteStartObject("artifactLocation");
        if (LocationResolver.IsLabel(finding.FullPath))
        {
            // A library sheet inside the tool: not a file of the scanned tree, so no base directory applies.
            w.WriteString("uri", RelativeUri(finding.FullPath));
        }
        else if (DisplayPaths.RelativeInside(finding.FullPath, workingDirectory) is { } relative)
        {
            w.WriteString("uri", RelativeUri(relative));
            w.WriteString("uriBaseId", RootBaseId);
        }
        else
        {
            w.WriteString("uri", new Uri(finding.FullPath).AbsoluteUri);
        }
        w.WriteEndObject();
        w.WriteStartObject("region");
        w.WriteNumber("startLine", finding.Range.StartLine);
        w.WriteNumber("startColumn", finding.Range.StartColumn);
        w.WriteNumber("endLine", finding.Range.EndLine);
        w.WriteNumber("endColumn", finding.Range.EndColumn);
        w.WriteEndObject();
        w.WriteEndObject();
        w.WriteEndObject();
        w.WriteEndArray();
        w.WriteEndObject();
    }

    /// <summary>A relative path as a URI reference: forward slashes, each segment percent-encoded.</summary>
    public static string RelativeUri(string relativePath) =>
        string.Join('/', DisplayPaths.WithForwardSlashes(relativePath).Split('/').Select(Uri.EscapeDataString));

    private static string DirectoryUri(string directory)
    {
        string uri = new Uri(Path.GetFullPath(directory)).AbsoluteUri;
        return uri.EndsWith('/') ? uri : uri + "/";
    }
}
