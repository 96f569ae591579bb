using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>ANSI colour only on a terminal without NO_COLOR (https://no-color.org) and not for machine formats.</summary>
public sealed class ColourTests
{
    private const char Escape = '\u001b';

    private static CliOutcome Run(bool terminal, Dictionary<string, string> environment, params string[] args) =>
        CliDriver.Run(args, environment, Sheets.Directory, terminal);

    [Fact]
    public void A_terminal_gets_colour()
    {
        Assert.Contains(Escape, Run(terminal: true, [], "run", "demo.cutsheet").Out);
        Assert.Contains(Escape, Run(terminal: true, [], "check", "unit-error.cutsheet").Out);
    }

    [Fact]
    public void Redirected_output_is_plain()
    {
        Assert.DoesNotContain(Escape, Run(terminal: false, [], "run", "demo.cutsheet").Out);
        Assert.DoesNotContain(Escape, Run(terminal: false, [], "check", "unit-error.cutsheet", "demo.cutsheet").Out);
    }

    [Theory]
    [InlineData("1")]
    [InlineData("true")]
    [InlineData("0")] // any non-empty value disables colour, even "0"
    public void NO_COLOR_disables_colour_on_a_terminal(string value)
    {
        var environment = new Dictionary<string, string> { ["NO_COLOR"] = value };
        Assert.DoesNotContain(Escape, Run(terminal: true, environment, "run", "demo.cutsheet").Out);
        Assert.DoesNotContain(Escape, Run(terminal: true, environment, "check", "unit-error.cutsheet").Out);
    }

    [Fact]
    public void An_empty_NO_COLOR_does_not_disable_colour()
    {
        var environment = new Dictionary<string, string> { ["NO_COLOR"] = "" };
        Assert.Contains(Escape, Run(terminal: true, environment, "run", "demo.cutsheet").Out);
    }

    [Fact]
    public void A_dumb_terminal_gets_no_colour()
    {
        var environment = new Dictionary<string, string> { ["TERM"] = "dumb" };
        Assert.DoesNotContain(Escape, Run(terminal: true, environment, "run", "demo.cutsheet").Out);
    }

    [Theory]
    [InlineData("run", "json")]
    [InlineData("check", "json")]
    [InlineData("check", "sarif")]
    public void Machine_formats_are_never_coloured(string command, string format)
    {
        Assert.DoesNotContain(Escape, Run(terminal: true, [], command, "demo.cutsheet", "--format", format).Out);
    }

    [Fact]
    public void Coloured_and_plain_text_say_the_same()
    {
        string plain = Run(terminal: false, [], "run", "demo.cutsheet").Out;
        string coloured = Run(terminal: true, [], "run", "demo.cutsheet").Out;
        Assert.Equal(plain, System.Text.RegularExpressions.Regex.Replace(coloured, "\u001b\\[[0-9;]*m", ""));
    }
}
