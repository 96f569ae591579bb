using System.CommandLine;

namespace CutSheet.Cli.Commands;

/// <summary>Turns the parser's errors into the one line a usage error is allowed.</summary>
internal static class ParseErrorText
{
    public static string Describe(ParseResult parse)
    {
        var messages = parse.Errors.Select(e => CliApp.OneLine(e.Message)).Where(m => m.Length > 0).Distinct(StringComparer.Ordinal);
        string command = parse.CommandResult.Command is RootCommand
            ? CliApp.CommandName
            : $"{CliApp.CommandName} {parse.CommandResult.Command.Name}";
        return $"{string.Join("; ", messages)} (see '{command} --help')";
    }
}
