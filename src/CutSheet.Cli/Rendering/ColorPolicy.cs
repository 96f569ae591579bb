namespace CutSheet.Cli.Rendering;

/// <summary>
/// Colour only where a person is watching: standard output is a terminal, <c>NO_COLOR</c> is unset or
/// empty (https://no-color.org), and the terminal does not declare itself <c>dumb</c>.
/// </summary>
internal static class ColorPolicy
{
    public static bool UseColor(CliHost host) =>
        host.OutputIsTerminal
        && string.IsNullOrEmpty(host.Environment("NO_COLOR"))
        && !string.Equals(host.Environment("TERM"), "dumb", StringComparison.Ordinal);
}
