using System.CommandLine;
using System.CommandLine.Help;

namespace CutSheet.Cli.Commands;

/// <summary>Builds the command tree: <c>cutsheet run</c>, <c>cutsheet check</c>, and <c>--help</c> / <c>--version</c> on every level.</summary>
internal static class CommandTree
{
    public const string RootDetails =
        "Results are engineering estimates; verify them against the machine builder's data, local codes and\n" +
        "licensed practice.\n\n" + ExitCodeHelp.Common;

    public static RootCommand Build(CliHost host)
    {
        var root = new RootCommand("CutSheet: evaluate and check unit-aware worksheets (.cutsheet files) for machine-tool engineering");

        // The built-in version option prints the entry assembly's informational version (the test host's, in-process)
        // and exists only on the root; ours prints the tool version and works after any command.
        root.Options.Remove(root.Options.OfType<VersionOption>().Single());
        root.Options.Add(new Option<bool>("--version")
        {
            Description = "Show the tool version and exit",
            Recursive = true,
            Arity = ArgumentArity.Zero,
            Action = new ToolVersionAction(),
        });

        // Directives such as [diagram] are a debugging aid of the parser, not part of this tool's interface.
        root.Directives.Clear();

        var run = RunCommand.Create(host);
        var check = CheckCommand.Create(host);
        root.Subcommands.Add(run);
        root.Subcommands.Add(check);
        var lsp = LspCommand.Create();
        root.Subcommands.Add(lsp);

        var help = root.Options.OfType<HelpOption>().Single();
        help.Action = new HelpWithDetailsAction((HelpAction)help.Action!, new Dictionary<Command, string>
        {
            [root] = RootDetails,
            [run] = RunCommand.Details,
            [check] = CheckCommand.Details,
            [lsp] = LspCommand.Details,
        });

        root.SetAction(NoCommand);
        return root;
    }

    private static int NoCommand(ParseResult parse) =>
        throw new CliUsageException($"no command given; use '{CliApp.CommandName} run FILE' or '{CliApp.CommandName} check PATH...' (see '{CliApp.CommandName} --help')");
}
