using System.Text.RegularExpressions;
using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>
/// The text listing of <c>cutsheet run</c>. Expected numbers are computed by hand:
/// T = F·P_h / (2π·η) = 1100 N × 0.005 m / (2π × 0.9) = 0.972614 N·m [calc], shown to 4 significant figures as 0.9726.
/// </summary>
public sealed partial class RunTextTests
{
    private static string[] Lines(CliOutcome outcome) => outcome.Out.Split('\n');

    private static string RowOf(CliOutcome outcome, int line, string label) =>
        Lines(outcome).Single(l => Regex.IsMatch(l, $@"^\s*{line}\s+{Regex.Escape(label)}\s"));

    [Fact]
    public void Lists_each_definition_with_line_name_value_unit_and_description()
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet");
        Assert.Matches(@"^\s*3\s+d\s+16\.00\s+mm\s+nominal diameter$", RowOf(outcome, 3, "d"));
        Assert.Matches(@"^\s*4\s+P_h\s+5\.000\s+mm/rev\s+lead$", RowOf(outcome, 4, "P_h"));
        Assert.Matches(@"^\s*5\s+F\s+1\.100\s+kN$", RowOf(outcome, 5, "F"));
        Assert.Matches(@"^\s*6\s+T\s+0\.9726\s+N·m$", RowOf(outcome, 6, "T"));
    }

    [Fact]
    public void Values_and_units_are_aligned_in_columns()
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet");
        var rows = new[] { RowOf(outcome, 3, "d"), RowOf(outcome, 4, "P_h"), RowOf(outcome, 5, "F"), RowOf(outcome, 6, "T") };
        // Decimal points line up, and so do the units that follow the numbers.
        Assert.Single(rows.Select(r => r.IndexOf('.')).Distinct());
        var unitStarts = rows.Select(r => Regex.Match(r, @"\d\s+(?<u>[A-Za-zµ])").Groups["u"].Index).Distinct();
        Assert.Single(unitStarts);
    }

    [Fact]
    public void Headings_are_section_lines()
    {
        Assert.Contains("# Demo", Lines(CliDriver.Run("run", "demo.cutsheet")));
    }

    [Fact]
    public void A_passing_check_shows_status_utilisation_and_margin()
    {
        // utilisation = 0.972614 / 2 = 48.63 % → "48.6 %"; margin = 2 − 0.972614 = 1.027386 N·m → "1.027 N·m" [calc]
        var row = RowOf(CliDriver.Run("run", "demo.cutsheet"), 7, "check");
        Assert.Matches(@"passed\s+48\.6 %\s+margin 1\.027 N·m\s+T <= 2 N·m", row);
        Assert.EndsWith("motor limit", row);
    }

    [Fact]
    public void A_failed_check_says_FAILED()
    {
        // x = 1 mm against x >= 2 mm: margin = 1 − 2 = −1 mm [calc]
        var outcome = CliDriver.Run("run", "failed-check.cutsheet");
        var row = RowOf(outcome, 2, "check");
        Assert.Contains("FAILED", row);
        Assert.Contains("margin -1.000 mm", row);
        Assert.Contains(Rendering.SafetyNotice.Text, outcome.Out);
    }

    [Fact]
    public void A_check_on_unknown_values_is_NOT_EVALUATED_never_passed()
    {
        var outcome = CliDriver.Run("run", "not-evaluated.cutsheet");
        var row = RowOf(outcome, 2, "check");
        Assert.Contains("NOT EVALUATED", row);
        Assert.DoesNotContain("passed", row);
        Assert.Contains(Rendering.SafetyNotice.Text, outcome.Out);
    }

    [Fact]
    public void A_fired_caution_is_listed_with_its_level_and_triggers_the_safety_line()
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet");
        Assert.Matches(@"^\s*8\s+CAUTION\s+watch it$", RowOf(outcome, 8, "CAUTION"));
        Assert.Equal(Rendering.SafetyNotice.Text, Lines(outcome).Last(l => l.Length > 0));
    }

    [Fact]
    public void An_accepted_caution_is_marked_with_its_reason()
    {
        var row = RowOf(CliDriver.Run("run", "accepted.cutsheet"), 2, "CAUTION");
        Assert.Contains("[accepted: the axis is locked when idle]", row);
    }

    [Fact]
    public void A_clean_sheet_has_no_safety_line()
    {
        var outcome = CliDriver.Run("run", "clean.cutsheet");
        Assert.Equal(0, outcome.ExitCode);
        Assert.DoesNotContain(Rendering.SafetyNotice.Text, outcome.Out);
    }

    [Fact]
    public void Diagnostics_follow_as_path_line_column_severity_code_message()
    {
        var outcome = CliDriver.Run("run", "unit-error.cutsheet");
        Assert.Contains(Lines(outcome), l => Regex.IsMatch(l, @"^unit-error\.cutsheet:1:\d+: error CUT2101 \S"));
        Assert.Matches(@"^\s*1\s+x\s+\?", RowOf(outcome, 1, "x"));
    }

    [Fact]
    public void Set_replaces_an_input()
    {
        // T = 2200 N × 0.005 m / (2π × 0.9) = 1.945227 N·m → "1.945" [calc]
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", "F=2.2 kN");
        Assert.Equal(0, outcome.ExitCode);
        Assert.Matches(@"^\s*6\s+T\s+1\.945\s+N·m$", RowOf(outcome, 6, "T"));
        Assert.Contains("[set to 2.2 kN]", RowOf(outcome, 5, "F"));
    }

    [Fact]
    public void Set_may_be_given_several_times()
    {
        // T = 2200 N × 0.010 m / (2π × 0.9) = 3.890454 N·m → "3.890"; 3.890 > 2 N·m so the check fails [calc]
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", "F=2.2 kN", "--set", "P_h=10 mm/rev");
        Assert.Equal(1, outcome.ExitCode);
        Assert.Matches(@"^\s*6\s+T\s+3\.890\s+N·m$", RowOf(outcome, 6, "T"));
    }

    [Fact]
    public void Set_refuses_a_value_of_another_dimension()
    {
        // F is a force in demo.cutsheet; a plain 2200 cannot stand in for it, and T, which needs F, stays unknown.
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", "F=2200");
        Assert.Equal(1, outcome.ExitCode);
        Assert.Contains(Lines(outcome), l => l.StartsWith("demo.cutsheet:5:1: error CUT2112 --set F: ", StringComparison.Ordinal));
        Assert.Matches(@"^\s*6\s+T\s+\?", RowOf(outcome, 6, "T"));
    }

    [Fact]
    public void Set_of_a_mistyped_input_suggests_the_nearest_one()
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", "P_j=10 mm/rev");
        Assert.Equal(1, outcome.ExitCode);
        Assert.Contains(Lines(outcome), l => l.Contains("error CUT3011 ", StringComparison.Ordinal) && l.EndsWith("has no definition 'P_j'; did you mean 'P_h'?", StringComparison.Ordinal));
    }

    [Fact]
    public void Set_of_a_computed_value_is_refused_at_its_line()
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", "T=1 N·m");
        Assert.Equal(1, outcome.ExitCode);
        Assert.Contains(Lines(outcome), l => l == "demo.cutsheet:6:1: error CUT3011 " + Language.Diagnostics.DiagnosticMessages.SetNotInput("T"));
    }

    [Fact]
    public void Units_inch_shows_computed_values_in_inch()
    {
        // L = 2 × 25.4 mm = 50.8 mm = 2 in exactly [calc]
        Assert.Matches(@"^\s*2\s+L\s+50\.80\s+mm\b", RowOf(CliDriver.Run("run", "inch.cutsheet"), 2, "L"));
        Assert.Matches(@"^\s*2\s+L\s+2\.000\s+in\b", RowOf(CliDriver.Run("run", "inch.cutsheet", "--units", "inch"), 2, "L"));
    }

    [Fact]
    public void Digits_sets_significant_figures()
    {
        // 0.9726135 to 6 significant figures = 0.972614 [calc]
        Assert.Matches(@"^\s*6\s+T\s+0\.972614\s+N·m$", RowOf(CliDriver.Run("run", "demo.cutsheet", "--digits", "6"), 6, "T"));
    }

    [Fact]
    public void Output_uses_the_invariant_culture_whatever_the_current_culture()
    {
        var before = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            // A decimal-comma culture built by hand: named cultures are unavailable where ICU is not installed.
            var comma = (System.Globalization.CultureInfo)System.Globalization.CultureInfo.InvariantCulture.Clone();
            comma.NumberFormat.NumberDecimalSeparator = ",";
            comma.NumberFormat.PercentDecimalSeparator = ",";
            System.Globalization.CultureInfo.CurrentCulture = comma;
            var row = RowOf(CliDriver.Run("run", "demo.cutsheet"), 7, "check");
            Assert.Contains("48.6 %", row);
        }
        finally
        {
            System.Globalization.CultureInfo.CurrentCulture = before;
        }
    }

    [Fact]
    public void Run_never_writes_to_the_sheet()
    {
        using var dir = new TempDirectory();
        string path = dir.Write("s.cutsheet", File.ReadAllText(Sheets.PathOf("demo.cutsheet")));
        var stamp = File.GetLastWriteTimeUtc(path);
        byte[] bytes = File.ReadAllBytes(path);
        CliDriver.RunIn(dir.Path, "run", "s.cutsheet", "--set", "F=2 kN");
        CliDriver.RunIn(dir.Path, "check", ".", "--format", "sarif");
        Assert.Equal(bytes, File.ReadAllBytes(path));
        Assert.Equal(stamp, File.GetLastWriteTimeUtc(path));
        Assert.Single(Directory.EnumerateFileSystemEntries(dir.Path));
    }
}
