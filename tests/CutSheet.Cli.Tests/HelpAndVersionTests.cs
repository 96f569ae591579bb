using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary><c>--help</c> and <c>--version</c> on every command.</summary>
public sealed class HelpAndVersionTests
{
    // The version the language assembly carries (Directory.Build.props), read from its metadata.
    private static readonly string AssemblyVersion =
        typeof(Language.Results.SheetResult).Assembly.GetName().Version!.ToString(3);

    [Theory]
    [InlineData("--version")]
    [InlineData("run", "--version")]
    [InlineData("check", "--version")]
    [InlineData("run", "demo.cutsheet", "--version")]
    public void Version_prints_the_tool_version(params string[] args)
    {
        var outcome = CliDriver.Run(args);
        Assert.Equal(0, outcome.ExitCode);
        Assert.Equal(AssemblyVersion, outcome.Out.Trim());
        Assert.Matches(@"^\d+\.\d+\.\d+$", outcome.Out.Trim());
    }

    [Theory]
    [InlineData("--help")]
    [InlineData("-h")]
    [InlineData("run", "--help")]
    [InlineData("check", "--help")]
    public void Help_documents_the_exit_codes(params string[] args)
    {
        var outcome = CliDriver.Run(args);
        Assert.Equal(0, outcome.ExitCode);
        Assert.Contains("Exit codes:", outcome.Out);
        Assert.Matches(@"(?m)^\s+0\s", outcome.Out);
        Assert.Matches(@"(?m)^\s+1\s", outcome.Out);
        Assert.Matches(@"(?m)^\s+2\s", outcome.Out);
    }

    [Fact]
    public void Root_help_lists_the_commands()
    {
        var outcome = CliDriver.Run("--help");
        Assert.Matches(@"(?m)^\s+run\b", outcome.Out);
        Assert.Matches(@"(?m)^\s+check\b", outcome.Out);
    }

    [Fact]
    public void Check_help_says_columns_are_utf16_code_units_from_1()
    {
        string help = CliDriver.Run("check", "--help").Out;
        Assert.Contains("UTF-16 code units", help);
        Assert.Contains("--fail-on", help);
        Assert.Contains("sarif", help);
    }

    [Fact]
    public void Run_help_lists_its_options()
    {
        string help = CliDriver.Run("run", "--help").Out;
        foreach (string option in new[] { "--format", "--set", "--units", "--digits", "--workspace", "NAME=VALUE", "metric|inch|both" })
        {
            Assert.Contains(option, help);
        }
    }
}
