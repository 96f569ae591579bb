using System.Text.Json;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Output.Json;

/// <summary>Fields shared by the JSON documents: numbers that may be missing, values, ranges, findings.</summary>
internal static class JsonFields
{
    public const int SchemaVersion = 1;

    public static void WriteHeader(Utf8JsonWriter w)
    {
        w.WriteNumber("schemaVersion", SchemaVersion);
        w.WriteStartObject("tool");
        w.WriteString("name", ToolInfo.Name);
        w.WriteString("version", ToolInfo.Version);
        w.WriteEndObject();
    }

    /// <summary>A double written shortest-round-trip (reading it back gives the same double); null when absent or not finite.</summary>
    public static void WriteNumber(Utf8JsonWriter w, string name, double? value)
    {
        if (value is { } v && double.IsFinite(v)) w.WriteNumber(name, v);
        else w.WriteNull(name);
    }

    public static void WriteStringOrNull(Utf8JsonWriter w, string name, string? value)
    {
        if (value is null) w.WriteNull(name);
        else w.WriteString(name, value);
    }

    /// <summary>
    /// A displayed value: <c>number</c> is the unrounded number in the display <c>unit</c>, <c>text</c> what
    /// the listing shows (rounded), <c>si</c> the value in coherent SI units, <c>dimension</c> its ISO 80000 symbols.
    /// </summary>
    public static void WriteValue(Utf8JsonWriter w, string name, DisplayedValue? value)
    {
        if (value is null)
        {
            w.WriteNull(name);
            return;
        }
        w.WriteStartObject(name);
        WriteNumber(w, "number", value.Number);
        w.WriteString("unit", value.Unit);
        w.WriteString("numberText", value.NumberText);
        w.WriteString("text", value.Text);
        WriteNumber(w, "si", value.Quantity.Si);
        w.WriteString("dimension", value.Quantity.Dimension.ToString());
        if (value.Alternate is not null) w.WriteString("alternate", value.Alternate);
        w.WriteEndObject();
    }

    /// <summary>Start and end, lines and columns from 1, columns in UTF-16 code units, the end exclusive.</summary>
    public static void WriteRange(Utf8JsonWriter w, SourceRange range)
    {
        w.WriteNumber("line", range.StartLine);
        w.WriteNumber("column", range.StartColumn);
        w.WriteNumber("endLine", range.EndLine);
        w.WriteNumber("endColumn", range.EndColumn);
    }

    public static void WriteFinding(Utf8JsonWriter w, Finding finding)
    {
        w.WriteStartObject();
        w.WriteString("code", finding.Code);
        w.WriteString("severity", SeverityNames.Word(finding.Severity));
        w.WriteString("path", finding.DisplayPath);
        WriteRange(w, finding.Range);
        w.WriteString("message", finding.Message);
        w.WriteStartArray("fixes");
        foreach (var fix in finding.Fixes)
        {
            w.WriteStartObject();
            w.WriteString("title", fix.Title);
            w.WriteStartArray("edits");
            foreach (var edit in fix.Edits)
            {
                w.WriteStartObject();
                w.WriteString("path", edit.DisplayPath);
                WriteRange(w, edit.Range);
                w.WriteString("newText", edit.NewText);
                w.WriteEndObject();
            }
            w.WriteEndArray();
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteStartArray("related");
        foreach (var related in finding.Related)
        {
            w.WriteStartObject();
            w.WriteString("path", related.DisplayPath);
            WriteRange(w, related.Range);
            w.WriteString("message", related.Message);
            w.WriteEndObject();
        }
        w.WriteEndArray();
        w.WriteEndObject();
    }

    public static void WriteCheckAndCautionCounts(Utf8JsonWriter w, Evaluation.SheetTally tally)
    {
        w.WriteStartObject("checks");
        w.WriteNumber("passed", tally.ChecksPassed);
        w.WriteNumber("failed", tally.ChecksFailed);
        w.WriteNumber("notEvaluated", tally.ChecksNotEvaluated);
        w.WriteEndObject();
        w.WriteStartObject("cautions");
        w.WriteNumber("raised", tally.CautionsRaised);
        w.WriteNumber("accepted", tally.CautionsAccepted);
        w.WriteNumber("unaccepted", tally.CautionsUnaccepted);
        w.WriteEndObject();
    }
}
