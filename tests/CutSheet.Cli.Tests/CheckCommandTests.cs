using System.Text.Json;
using System.Text.RegularExpressions;
using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary><c>cutsheet check</c>: findings lines, directory expansion and order, summary, JSON, <c>--fail-on</c>.</summary>
public sealed class CheckCommandTests
{
    private static readonly string Sep = Path.DirectorySeparatorChar.ToString();

    [Fact]
    public void Findings_are_one_per_line_then_a_summary()
    {
        var outcome = CliDriver.Run("check", "unit-error.cutsheet", "clean.cutsheet", "failed-check.cutsheet");
        var lines = outcome.Out.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        // Sheets are checked in ordinal path order: clean, failed-check, unit-error.
        Assert.Matches(@"^failed-check\.cutsheet:2:1: error CUT4001 \S", lines[0]);
        Assert.Matches(@"^unit-error\.cutsheet:1:\d+: error CUT2101 \S", lines[1]);
        Assert.Equal("3 sheets checked: 2 errors, 0 warnings, 0 info, 1 failed check", lines[2]);
        Assert.Equal(Rendering.SafetyNotice.Text, lines[3]);
        Assert.Equal(4, lines.Length);
    }

    [Fact]
    public void Findings_include_warnings_and_info()
    {
        var outcome = CliDriver.Run("check", "caution.cutsheet", "accepted.cutsheet");
        Assert.Contains(outcome.Out.Split('\n'), l => Regex.IsMatch(l, @"^caution\.cutsheet:2:1: \w+ CUT4102 "));
        Assert.Contains(outcome.Out.Split('\n'), l => Regex.IsMatch(l, @"^accepted\.cutsheet:2:1: \w+ CUT4105 "));
    }

    [Fact]
    public void Column_counts_utf16_code_units_from_1()
    {
        // `caution "🔧" when qq > 1`: qq starts at UTF-16 column 19 (the emoji takes two code units) [counted].
        var outcome = CliDriver.Run("check", "positions.cutsheet");
        Assert.Contains(outcome.Out.Split('\n'), l => l.StartsWith("positions.cutsheet:3:19: error CUT3001 ", StringComparison.Ordinal));
    }

    [Fact]
    public void Directories_are_searched_recursively_in_ordinal_order()
    {
        // Ordinal order puts 'Z' (U+005A) before 'a' (U+0061); a culture-aware sort would not.
        var doc = Json.Parse(CliDriver.Run("check", "tree", "--format", "json").Out);
        var paths = doc.GetProperty("files").EnumerateArray().Select(f => f.GetProperty("path").GetString()).ToList();
        Assert.Equal([$"tree{Sep}Zeta.cutsheet", $"tree{Sep}a{Sep}z.cutsheet", $"tree{Sep}beta.cutsheet"], paths);
        Assert.Equal(3, doc.GetProperty("summary").GetProperty("sheets").GetInt32());
    }

    [Fact]
    public void Clean_tree_summary_and_exit_code()
    {
        var outcome = CliDriver.Run("check", "tree");
        Assert.Equal(0, outcome.ExitCode);
        Assert.Equal("3 sheets checked: 0 errors, 0 warnings, 0 info, 0 failed checks", outcome.Out.Trim());
    }

    [Fact]
    public void A_file_given_twice_is_checked_once()
    {
        var outcome = CliDriver.Run("check", "tree", Sheets.PathOf("tree/beta.cutsheet"));
        Assert.StartsWith("3 sheets checked", outcome.Out);
    }

    [Fact]
    public void A_finding_in_an_imported_file_is_reported_once()
    {
        // lib.cutsheet's unit error is found when lib is checked and again through main's import.
        var doc = Json.Parse(CliDriver.Run("check", "imports", "--format", "json").Out);
        var findings = doc.GetProperty("findings").EnumerateArray().ToList();
        Assert.Single(findings, f => f.GetProperty("code").GetString() == "CUT2101");
        Assert.Equal(2, doc.GetProperty("files").GetArrayLength());
    }

    [Fact]
    public void Json_has_schema_files_findings_and_summary()
    {
        var outcome = CliDriver.Run("check", "not-evaluated.cutsheet", "demo.cutsheet", "--format", "json");
        Assert.Equal(1, outcome.ExitCode);
        var doc = Json.Parse(outcome.Out);
        Assert.Equal(1, doc.GetProperty("schemaVersion").GetInt32());
        Assert.Equal("error", doc.GetProperty("failOn").GetString());
        Assert.Equal(["demo.cutsheet", "not-evaluated.cutsheet"],
            doc.GetProperty("files").EnumerateArray().Select(f => f.GetProperty("path").GetString()));
        var finding = doc.GetProperty("findings").EnumerateArray().First(f => f.GetProperty("code").GetString() == "CUT4002");
        Assert.Equal("error", finding.GetProperty("severity").GetString());
        Assert.Equal("not-evaluated.cutsheet", finding.GetProperty("path").GetString());
        Assert.Equal(2, finding.GetProperty("line").GetInt32());
        Assert.Equal(1, finding.GetProperty("column").GetInt32());
        var summary = doc.GetProperty("summary");
        Assert.Equal(2, summary.GetProperty("sheets").GetInt32());
        Assert.Equal(1, summary.GetProperty("checks").GetProperty("notEvaluated").GetInt32());
        Assert.Equal(1, summary.GetProperty("checks").GetProperty("passed").GetInt32());
        Assert.Equal(1, summary.GetProperty("exitCode").GetInt32());
    }

    [Fact]
    public void Fail_on_caution_fails_a_raised_caution()
    {
        Assert.Equal(0, CliDriver.Run("check", "caution.cutsheet").ExitCode);
        Assert.Equal(1, CliDriver.Run("check", "caution.cutsheet", "--fail-on", "caution").ExitCode);
        Assert.Equal(1, CliDriver.Run("check", "demo.cutsheet", "--fail-on", "caution").ExitCode);
    }

    [Fact]
    public void Fail_on_caution_passes_an_accepted_caution()
    {
        var outcome = CliDriver.Run("check", "accepted.cutsheet", "--fail-on", "caution");
        Assert.True(outcome.ExitCode == 0, outcome.ToString());
    }

    [Fact]
    public void Fail_on_caution_passes_a_clean_sheet()
    {
        Assert.Equal(0, CliDriver.Run("check", "clean.cutsheet", "--fail-on", "caution").ExitCode);
    }

    [Fact]
    public void Fail_on_caution_is_recorded_in_json()
    {
        var doc = Json.Parse(CliDriver.Run("check", "caution.cutsheet", "--fail-on", "caution", "--format", "json").Out);
        Assert.Equal("caution", doc.GetProperty("failOn").GetString());
        Assert.Equal(1, doc.GetProperty("summary").GetProperty("exitCode").GetInt32());
        Assert.Equal(1, doc.GetProperty("summary").GetProperty("cautions").GetProperty("unaccepted").GetInt32());
    }

    [Fact]
    public void Paths_outside_the_working_directory_are_shown_in_full()
    {
        using var dir = new TempDirectory();
        var outcome = CliDriver.RunIn(dir.Path, "check", Sheets.PathOf("unit-error.cutsheet"));
        Assert.StartsWith(Sheets.PathOf("unit-error.cutsheet") + ":1:", outcome.Out);
    }

    [Fact]
    public void Json_files_report_workspace_root_from_the_nearest_git_ancestor()
    {
        using var dir = new TempDirectory();
        Directory.CreateDirectory(Path.Combine(dir.Path, ".git"));
        dir.Write("deep/er/s.cutsheet", "a = 1 mm\n");
        var doc = Json.Parse(CliDriver.RunIn(dir.Path, "check", ".", "--format", "json").Out);
        Assert.Equal(dir.Path, doc.GetProperty("files")[0].GetProperty("workspaceRoot").GetString());
    }

    [Fact]
    public void Workspace_option_wins()
    {
        using var dir = new TempDirectory();
        Directory.CreateDirectory(Path.Combine(dir.Path, ".git"));
        string sheet = dir.Write("deep/s.cutsheet", "a = 1 mm\n");
        var doc = Json.Parse(CliDriver.RunIn(dir.Path, "check", sheet, "--workspace", "deep", "--format", "json").Out);
        Assert.Equal(Path.Combine(dir.Path, "deep"), doc.GetProperty("files")[0].GetProperty("workspaceRoot").GetString());
    }

    [Fact]
    public void Without_git_the_workspace_is_the_sheets_directory()
    {
        using var dir = new TempDirectory();
        dir.Write("deep/s.cutsheet", "a = 1 mm\n");
        var doc = Json.Parse(CliDriver.RunIn(dir.Path, "check", ".", "--format", "json").Out);
        // The temp folder might sit inside a repository on a developer machine; then that root is right too.
        string root = doc.GetProperty("files")[0].GetProperty("workspaceRoot").GetString()!;
        Assert.True(root == Path.Combine(dir.Path, "deep") || Directory.Exists(Path.Combine(root, ".git")), root);
    }
}
