using System.CommandLine;
using System.CommandLine.Invocation;

namespace CutSheet.Cli.Commands;

/// <summary>Prints the tool version (the one recorded in JSON and SARIF output) and ends the command.</summary>
internal sealed class ToolVersionAction : SynchronousCommandLineAction
{
    // `cutsheet run --version` must print the version even though FILE is missing.
    public override bool ClearsParseErrors => true;

    public override int Invoke(ParseResult parseResult)
    {
        parseResult.InvocationConfiguration.Output.WriteLine(ToolInfo.Version);
        return ExitCodes.Clean;
    }
}
