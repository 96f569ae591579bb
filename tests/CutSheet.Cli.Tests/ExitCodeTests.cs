using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>Exit codes: 0 clean, 1 findings, 2 usage or input errors (with one line on stderr and nothing on stdout).</summary>
public sealed class ExitCodeTests
{
    [Theory]
    [InlineData("clean.cutsheet", 0)]
    [InlineData("demo.cutsheet", 0)] // a caution alone does not fail run
    [InlineData("accepted.cutsheet", 0)]
    [InlineData("unit-error.cutsheet", 1)]
    [InlineData("failed-check.cutsheet", 1)]
    [InlineData("not-evaluated.cutsheet", 1)]
    public void Run_exit_code_follows_the_sheet(string sheet, int expected)
    {
        var outcome = CliDriver.Run("run", Sheets.PathOf(sheet));
        Assert.True(expected == outcome.ExitCode, outcome.ToString());
        Assert.Equal("", outcome.Error);
    }

    [Theory]
    [InlineData("clean.cutsheet", 0)]
    [InlineData("demo.cutsheet", 0)]
    [InlineData("unit-error.cutsheet", 1)]
    [InlineData("failed-check.cutsheet", 1)]
    [InlineData("not-evaluated.cutsheet", 1)]
    public void Check_exit_code_follows_the_sheet(string sheet, int expected)
    {
        var outcome = CliDriver.Run("check", Sheets.PathOf(sheet));
        Assert.True(expected == outcome.ExitCode, outcome.ToString());
    }

    [Fact]
    public void Check_of_several_sheets_fails_when_one_fails()
    {
        var outcome = CliDriver.Run("check", Sheets.PathOf("clean.cutsheet"), Sheets.PathOf("failed-check.cutsheet"));
        Assert.True(outcome.ExitCode == 1, outcome.ToString());
    }

    [Theory]
    [InlineData("run", "missing.cutsheet")]
    [InlineData("check", "missing.cutsheet")]
    [InlineData("run", "tree")] // a directory is not a sheet for run
    public void Missing_or_wrong_path_is_a_usage_error(string command, string path)
    {
        AssertUsageError(CliDriver.Run(command, Sheets.PathOf(path)));
    }

    [Fact]
    public void Directory_without_sheets_is_a_usage_error()
    {
        using var dir = new TempDirectory();
        dir.Write("readme.txt", "no sheets here");
        Directory.CreateDirectory(System.IO.Path.Combine(dir.Path, "empty"));
        var outcome = CliDriver.RunIn(dir.Path, "check", ".");
        AssertUsageError(outcome);
        Assert.Contains("no *.cutsheet files", outcome.Error);
    }

    [Fact]
    public void Invalid_utf8_is_a_usage_error()
    {
        using var dir = new TempDirectory();
        string path = System.IO.Path.Combine(dir.Path, "bad.cutsheet");
        File.WriteAllBytes(path, [(byte)'a', (byte)' ', (byte)'=', (byte)' ', 0xC3, 0x28, (byte)'\n']);
        var outcome = CliDriver.RunIn(dir.Path, "run", "bad.cutsheet");
        AssertUsageError(outcome);
        Assert.Contains("UTF-8", outcome.Error);
    }

    [Theory]
    [InlineData("run", "clean.cutsheet", "--format", "yaml")]
    [InlineData("run", "clean.cutsheet", "--format", "sarif")] // SARIF is for check only
    [InlineData("run", "clean.cutsheet", "--units", "furlong")]
    [InlineData("run", "clean.cutsheet", "--digits", "0")]
    [InlineData("run", "clean.cutsheet", "--digits", "four")]
    [InlineData("run", "clean.cutsheet", "--bogus")]
    [InlineData("run", "clean.cutsheet", "--workspace", "no-such-directory")]
    [InlineData("run")]
    [InlineData("run", "clean.cutsheet", "demo.cutsheet")]
    [InlineData("check")]
    [InlineData("check", "clean.cutsheet", "--fail-on", "never")]
    [InlineData("check", "clean.cutsheet", "--digits", "3")]
    [InlineData("frobnicate")]
    [InlineData]
    public void Bad_usage_exits_2_with_one_line(params string[] args)
    {
        AssertUsageError(CliDriver.Run(args));
    }

    [Theory]
    [InlineData("F")]          // no '='
    [InlineData("=2 kN")]      // no name
    [InlineData("F=")]         // no value
    public void Malformed_set_is_a_usage_error(string assignment)
    {
        var outcome = CliDriver.Run("run", "demo.cutsheet", "--set", assignment);
        AssertUsageError(outcome);
        Assert.Contains("--set", outcome.Error);
    }

    [Fact]
    public void The_same_input_set_twice_is_a_usage_error()
    {
        AssertUsageError(CliDriver.Run("run", "demo.cutsheet", "--set", "F=1 kN", "--set", "F=2 kN"));
    }

    internal static void AssertUsageError(CliOutcome outcome)
    {
        Assert.True(outcome.ExitCode == 2, outcome.ToString());
        Assert.Equal("", outcome.Out);
        string[] lines = outcome.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries);
        Assert.True(lines.Length == 1, outcome.ToString());
        Assert.StartsWith("cutsheet: error: ", lines[0]);
    }
}
