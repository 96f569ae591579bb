using System.Text.Json;
using CutSheet.Cli.Tests.Support;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Tests;

/// <summary><c>cutsheet check --format sarif</c>: the SARIF 2.1.0 log structure code-scanning services read.</summary>
public sealed class SarifTests
{
    private static JsonElement Sarif(params string[] paths)
    {
        var outcome = CliDriver.Run(["check", .. paths, "--format", "sarif"]);
        Assert.True(outcome.Error.Length == 0, outcome.ToString());
        return Json.Parse(outcome.Out);
    }

    [Fact]
    public void Log_has_schema_version_and_one_run()
    {
        var log = Sarif("demo.cutsheet");
        Assert.Equal("https://json.schemastore.org/sarif-2.1.0.json", log.GetProperty("$schema").GetString());
        Assert.Equal("2.1.0", log.GetProperty("version").GetString());
        var run = Assert.Single(log.GetProperty("runs").EnumerateArray());
        Assert.Equal("utf16CodeUnits", run.GetProperty("columnKind").GetString());
    }

    [Fact]
    public void Driver_names_the_tool_and_its_rules()
    {
        var run = Sarif("unit-error.cutsheet", "not-evaluated.cutsheet", "demo.cutsheet").GetProperty("runs")[0];
        var driver = run.GetProperty("tool").GetProperty("driver");
        Assert.Equal("cutsheet", driver.GetProperty("name").GetString());
        Assert.Equal(SheetResult.ToolVersion, driver.GetProperty("version").GetString());
        Assert.True(Uri.IsWellFormedUriString(driver.GetProperty("informationUri").GetString(), UriKind.Absolute));

        var rules = driver.GetProperty("rules").EnumerateArray().ToList();
        var ids = rules.Select(r => r.GetProperty("id").GetString()).ToList();
        Assert.Equal(ids.Distinct().Count(), ids.Count);
        Assert.All(rules, r => Assert.False(string.IsNullOrWhiteSpace(r.GetProperty("shortDescription").GetProperty("text").GetString())));
        var used = run.GetProperty("results").EnumerateArray().Select(r => r.GetProperty("ruleId").GetString()).Distinct().Order();
        Assert.Equal(used, ids.Order());
        Assert.Contains("CUT2101", ids);
        Assert.Contains("CUT4002", ids);
    }

    [Fact]
    public void Results_have_level_message_and_region()
    {
        // `caution "🔧" when qq > 1`: qq spans UTF-16 columns 19..21 (end exclusive) on line 3 [counted].
        var run = Sarif("positions.cutsheet").GetProperty("runs")[0];
        var result = run.GetProperty("results").EnumerateArray().Single(r => r.GetProperty("ruleId").GetString() == "CUT3001");
        Assert.Equal("error", result.GetProperty("level").GetString());
        Assert.Contains("qq", result.GetProperty("message").GetProperty("text").GetString());
        var location = result.GetProperty("locations")[0].GetProperty("physicalLocation");
        Assert.Equal("positions.cutsheet", location.GetProperty("artifactLocation").GetProperty("uri").GetString());
        var region = location.GetProperty("region");
        Assert.Equal(3, region.GetProperty("startLine").GetInt32());
        Assert.Equal(19, region.GetProperty("startColumn").GetInt32());
        Assert.Equal(3, region.GetProperty("endLine").GetInt32());
        Assert.Equal(21, region.GetProperty("endColumn").GetInt32());
    }

    [Fact]
    public void Artifact_uris_are_relative_with_forward_slashes()
    {
        var run = Sarif("imports").GetProperty("runs")[0];
        var uris = run.GetProperty("results").EnumerateArray()
            .Select(r => r.GetProperty("locations")[0].GetProperty("physicalLocation").GetProperty("artifactLocation"))
            .ToList();
        Assert.Contains(uris, u => u.GetProperty("uri").GetString() == "imports/lib.cutsheet");
        Assert.All(uris, u => Assert.Equal("%SRCROOT%", u.GetProperty("uriBaseId").GetString()));
        var root = run.GetProperty("originalUriBaseIds").GetProperty("%SRCROOT%").GetProperty("uri").GetString()!;
        Assert.StartsWith("file:///", root);
        Assert.EndsWith("/", root);
    }

    [Fact]
    public void Information_findings_are_notes()
    {
        var run = Sarif("accepted.cutsheet").GetProperty("runs")[0];
        var result = run.GetProperty("results").EnumerateArray().Single(r => r.GetProperty("ruleId").GetString() == "CUT4105");
        Assert.Equal("note", result.GetProperty("level").GetString());
    }

    [Fact]
    public void A_clean_sheet_gives_an_empty_result_list()
    {
        var run = Sarif("clean.cutsheet").GetProperty("runs")[0];
        Assert.Equal(0, run.GetProperty("results").GetArrayLength());
        Assert.Equal(0, run.GetProperty("tool").GetProperty("driver").GetProperty("rules").GetArrayLength());
    }
}
