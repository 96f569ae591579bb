using CsCheck;
using CutSheet.Cli.Rendering;
using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>Properties over generated input: alignment, one-line errors, and a command line that never throws.</summary>
public sealed class PropertyTests
{
    [Fact]
    public void Decimal_points_line_up()
    {
        var number = Gen.Double[-1e6, 1e6].Select(d => d.ToString("0.####", System.Globalization.CultureInfo.InvariantCulture));
        number.Array[1, 12].Sample(numbers =>
        {
            var aligned = DecimalAligner.Align(numbers);
            // Where there is no decimal point, the end of the integer part is where it would be.
            var points = aligned.Select(a => a.Contains('.') ? a.IndexOf('.') : a.Length).Distinct().ToList();
            return points.Count == 1 && aligned.Zip(numbers).All(p => p.First.Trim() == p.Second);
        });
    }

    [Fact]
    public void Messages_are_collapsed_to_one_line()
    {
        Gen.String[Gen.Char["ab \r\n\t"], 0, 40].Sample(text =>
        {
            string line = CliApp.OneLine(text);
            return !line.Contains('\n') && !line.Contains('\r') && !line.Contains('\t');
        });
    }

    private static readonly string[] Vocabulary =
    [
        "run", "check", "demo.cutsheet", "clean.cutsheet", "unit-error.cutsheet", "tree", "missing.cutsheet",
        "--format", "json", "sarif", "text", "yaml", "--set", "F=2 kN", "F", "=", "--units", "inch", "both",
        "--digits", "0", "5", "99", "--fail-on", "caution", "error", "--workspace", ".", "--version", "--help",
        "-h", "--", "@file", "[diagram]", "",
    ];

    [Fact]
    public void Any_argument_list_gives_a_defined_exit_code_and_at_most_one_error_line()
    {
        Gen.Int[0, Vocabulary.Length - 1].Select(i => Vocabulary[i]).Array[0, 6].Sample(args =>
        {
            var outcome = CliDriver.Run(args);
            int errorLines = outcome.Error.Split('\n', StringSplitOptions.RemoveEmptyEntries).Length;
            return outcome.ExitCode switch
            {
                0 or 1 => errorLines == 0,
                2 => errorLines == 1 && outcome.Error.StartsWith("cutsheet: error: ", StringComparison.Ordinal),
                _ => false,
            };
        }, iter: 300);
    }
}
