using System.CommandLine;
using System.CommandLine.Help;
using System.CommandLine.Invocation;

namespace CutSheet.Cli.Commands;

/// <summary>
/// The parser's help, followed by a command's details (output format, exit codes). The details are kept out
/// of the command's description so that the command list in <c>cutsheet --help</c> stays one line per command;
/// System.CommandLine 2.0 offers no public way to add a help section, hence the wrapper.
/// </summary>
internal sealed class HelpWithDetailsAction(HelpAction inner, IReadOnlyDictionary<Command, string> details) : SynchronousCommandLineAction
{
    public override bool ClearsParseErrors => true;

    public override int Invoke(ParseResult parseResult)
    {
        int exitCode = inner.Invoke(parseResult);
        if (details.TryGetValue(parseResult.CommandResult.Command, out var text))
        {
            var output = parseResult.InvocationConfiguration.Output;
            output.WriteLine(text);
            output.WriteLine();
        }
        return exitCode;
    }
}
