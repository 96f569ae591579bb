using System.Globalization;
using System.Text.Json;
using CutSheet.Cli.Tests.Support;
using CutSheet.Language;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Tests;

/// <summary>
/// <c>cutsheet run --format json</c>. Hand-computed reference: T = 1100 N × 0.005 m / (2π × 0.9) =
/// 0.97261354111714 N·m; utilisation 0.97261354 / 2 = 0.48630677; margin 2 − 0.97261354 = 1.02738646 N·m [calc].
/// </summary>
public sealed class RunJsonTests
{
    private static JsonElement RunJson(params string[] args)
    {
        var outcome = CliDriver.Run(["run", .. args, "--format", "json"]);
        Assert.True(outcome.Error.Length == 0, outcome.ToString());
        return Json.Parse(outcome.Out);
    }

    [Fact]
    public void Has_schema_version_tool_file_and_settings()
    {
        var doc = RunJson("demo.cutsheet");
        Assert.Equal(1, doc.GetProperty("schemaVersion").GetInt32());
        Assert.Equal("cutsheet", doc.GetProperty("tool").GetProperty("name").GetString());
        Assert.Equal(SheetResult.ToolVersion, doc.GetProperty("tool").GetProperty("version").GetString());
        Assert.Equal("demo.cutsheet", doc.GetProperty("path").GetString());
        Assert.Equal(Sheets.PathOf("demo.cutsheet"), doc.GetProperty("fullPath").GetString());
        Assert.Equal("Demo", doc.GetProperty("metadata").GetProperty("title").GetString());
        Assert.Equal("metric", doc.GetProperty("display").GetProperty("units").GetString());
        Assert.Equal(4, doc.GetProperty("display").GetProperty("digits").GetInt32());
        Assert.Equal(JsonValueKind.Array, doc.GetProperty("imports").ValueKind);
    }

    [Fact]
    public void Statements_carry_kind_and_one_based_line()
    {
        var statements = RunJson("demo.cutsheet").GetProperty("statements").EnumerateArray().ToList();
        Assert.Equal(["heading", "metadata", "definition", "definition", "definition", "definition", "check", "caution"],
            statements.Select(s => s.GetProperty("kind").GetString()));
        Assert.Equal([1, 2, 3, 4, 5, 6, 7, 8], statements.Select(s => s.GetProperty("line").GetInt32()));
    }

    [Fact]
    public void A_definition_has_value_unit_si_dimension_and_description()
    {
        var doc = RunJson("demo.cutsheet");
        var t = Json.Statement(doc, "T");
        var value = t.GetProperty("value");
        Assert.Equal(0.97261354111714, value.GetProperty("number").GetDouble(), 1e-12);
        Assert.Equal("N·m", value.GetProperty("unit").GetString());
        Assert.Equal("0.9726 N·m", value.GetProperty("text").GetString());
        Assert.Equal(0.97261354111714, value.GetProperty("si").GetDouble(), 1e-12);
        Assert.Equal("L² M T⁻²", value.GetProperty("dimension").GetString()); // torque: kg·m²/s²
        Assert.False(t.GetProperty("isInput").GetBoolean());

        var d = Json.Statement(doc, "d");
        Assert.Equal(16, d.GetProperty("value").GetProperty("number").GetDouble());
        Assert.Equal(0.016, d.GetProperty("value").GetProperty("si").GetDouble(), 1e-15);
        Assert.Equal("nominal diameter", d.GetProperty("description").GetString());
        Assert.True(d.GetProperty("isInput").GetBoolean());
        Assert.False(d.GetProperty("assumed").GetBoolean());
    }

    [Fact]
    public void Numbers_round_trip_exactly()
    {
        // The JSON number must parse back to the very double the language computed, not a rounded one.
        var expected = SheetRunner.Run(File.ReadAllText(Sheets.PathOf("demo.cutsheet")), Sheets.PathOf("demo.cutsheet"))
            .Definitions.Single(d => d.Name == "T").Value!.Number;
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--format", "json");
        var number = Json.Statement(Json.Parse(outcome.Out), "T").GetProperty("value").GetProperty("number");
        Assert.Equal(expected, double.Parse(number.GetRawText(), CultureInfo.InvariantCulture));
    }

    [Fact]
    public void Checks_have_status_operator_value_limit_utilisation_and_margin()
    {
        var check = Assert.Single(RunJson("demo.cutsheet").GetProperty("checks").EnumerateArray());
        Assert.Equal(7, check.GetProperty("line").GetInt32());
        Assert.Equal("passed", check.GetProperty("status").GetString());
        Assert.Equal("<=", check.GetProperty("operator").GetString());
        Assert.Equal("T <= 2 N·m", check.GetProperty("expression").GetString());
        Assert.Equal(0.97261354111714, check.GetProperty("value").GetProperty("number").GetDouble(), 1e-12);
        Assert.Equal(2, check.GetProperty("limit").GetProperty("number").GetDouble());
        Assert.Equal(0.48630677055857, check.GetProperty("utilisation").GetDouble(), 1e-12);
        Assert.Equal(1.02738645888286, check.GetProperty("margin").GetProperty("number").GetDouble(), 1e-12);
        Assert.Equal("motor limit", check.GetProperty("description").GetString());
    }

    [Fact]
    public void A_not_evaluated_check_has_no_utilisation()
    {
        var doc = RunJson("not-evaluated.cutsheet");
        var check = Assert.Single(doc.GetProperty("checks").EnumerateArray());
        Assert.Equal("notEvaluated", check.GetProperty("status").GetString());
        Assert.Equal(JsonValueKind.Null, check.GetProperty("utilisation").ValueKind);
        Assert.Equal(1, doc.GetProperty("summary").GetProperty("exitCode").GetInt32());
        Assert.Equal(1, doc.GetProperty("summary").GetProperty("checks").GetProperty("notEvaluated").GetInt32());
    }

    [Fact]
    public void Diagnostics_have_code_severity_and_one_based_utf16_positions()
    {
        // Line 3 is `caution "🔧" when qq > 1`; "🔧" is two UTF-16 code units, so qq starts at column
        // 8 ("caution ") + 1 (quote) + 2 (emoji) + 1 (quote) + 6 (" when ") + 1 = 19, and ends before 21 [counted].
        var doc = RunJson("positions.cutsheet");
        var diagnostic = doc.GetProperty("diagnostics").EnumerateArray().Single(d => d.GetProperty("code").GetString() == "CUT3001");
        Assert.Equal("error", diagnostic.GetProperty("severity").GetString());
        Assert.Equal("positions.cutsheet", diagnostic.GetProperty("path").GetString());
        Assert.Equal(3, diagnostic.GetProperty("line").GetInt32());
        Assert.Equal(19, diagnostic.GetProperty("column").GetInt32());
        Assert.Equal(3, diagnostic.GetProperty("endLine").GetInt32());
        Assert.Equal(21, diagnostic.GetProperty("endColumn").GetInt32());
        Assert.Contains("qq", diagnostic.GetProperty("message").GetString());
        Assert.Equal(JsonValueKind.Array, diagnostic.GetProperty("fixes").ValueKind);
    }

    [Fact]
    public void A_unit_error_is_an_error_diagnostic_on_line_1()
    {
        var doc = RunJson("unit-error.cutsheet");
        var diagnostic = Assert.Single(doc.GetProperty("diagnostics").EnumerateArray());
        Assert.Equal("CUT2101", diagnostic.GetProperty("code").GetString());
        Assert.Equal("error", diagnostic.GetProperty("severity").GetString());
        Assert.Equal(1, diagnostic.GetProperty("line").GetInt32());
        Assert.Equal(JsonValueKind.Null, Json.Statement(doc, "x").GetProperty("value").ValueKind);
        Assert.Equal(1, doc.GetProperty("summary").GetProperty("exitCode").GetInt32());
    }

    [Fact]
    public void Cautions_are_listed_on_their_statement()
    {
        var doc = RunJson("accepted.cutsheet");
        var statement = doc.GetProperty("statements").EnumerateArray().Single(s => s.GetProperty("kind").GetString() == "caution");
        var caution = Assert.Single(statement.GetProperty("cautions").EnumerateArray());
        Assert.Equal("caution", caution.GetProperty("level").GetString());
        Assert.Equal("x", caution.GetProperty("message").GetString());
        Assert.True(caution.GetProperty("accepted").GetBoolean());
        Assert.Equal("the axis is locked when idle", caution.GetProperty("acceptedReason").GetString());
        Assert.Equal(JsonValueKind.String, doc.GetProperty("safetyNotice").ValueKind);
    }

    [Fact]
    public void A_clean_sheet_has_no_safety_notice_and_exit_code_0()
    {
        var doc = RunJson("clean.cutsheet");
        Assert.Equal(JsonValueKind.Null, doc.GetProperty("safetyNotice").ValueKind);
        Assert.Equal(0, doc.GetProperty("summary").GetProperty("exitCode").GetInt32());
    }

    [Fact]
    public void Set_is_recorded_and_changes_the_value()
    {
        // T = 2200 N × 0.005 m / (2π × 0.9) = 1.94522708223428 N·m [calc]
        var doc = RunJson("demo.cutsheet", "--set", "F=2.2 kN");
        Assert.Equal("2.2 kN", doc.GetProperty("overrides").GetProperty("F").GetString());
        Assert.True(Json.Statement(doc, "F").GetProperty("overridden").GetBoolean());
        Assert.Equal(1.94522708223428, Json.Statement(doc, "T").GetProperty("value").GetProperty("number").GetDouble(), 1e-12);
    }

    [Fact]
    public void Units_inch_changes_the_displayed_unit_not_the_si_value()
    {
        // L = 2 × 25.4 mm = 0.0508 m = 2 in [calc]
        var doc = RunJson("inch.cutsheet", "--units", "inch");
        var value = Json.Statement(doc, "L").GetProperty("value");
        Assert.Equal("in", value.GetProperty("unit").GetString());
        Assert.Equal(2, value.GetProperty("number").GetDouble(), 1e-12);
        Assert.Equal(0.0508, value.GetProperty("si").GetDouble(), 1e-15);
        Assert.Equal("inch", doc.GetProperty("display").GetProperty("units").GetString());
    }

    [Fact]
    public void An_imported_sheets_error_is_placed_in_that_file()
    {
        // imports/lib.cutsheet line 1 is `k = 2 kg + 1 mm`; main.cutsheet's `use` reports it as related information.
        var doc = RunJson("imports/main.cutsheet");
        var related = doc.GetProperty("diagnostics").EnumerateArray()
            .SelectMany(d => d.GetProperty("related").EnumerateArray())
            .Single(r => r.GetProperty("path").GetString()!.EndsWith("lib.cutsheet", StringComparison.Ordinal));
        Assert.Equal(DisplayPath("imports/lib.cutsheet"), related.GetProperty("path").GetString());
        Assert.Equal(1, related.GetProperty("line").GetInt32());
    }

    private static string DisplayPath(string relative) => relative.Replace('/', Path.DirectorySeparatorChar);
}
