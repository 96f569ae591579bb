using System.CommandLine;
using CutSheet.LanguageServer;

namespace CutSheet.Cli.Commands;

/// <summary>
/// <c>cutsheet lsp</c>: the language server for editors, over standard input and output.
/// Standard output then carries the protocol only: the raw stream is taken first, and the
/// console's writer is pointed at standard error, so no stray write can corrupt the stream.
/// </summary>
internal static class LspCommand
{
    public const string Details =
        "Speaks the Language Server Protocol over standard input and output until the editor sends 'exit'.\n" +
        "Logs go to standard error. Exit code 0 after the editor's shutdown and exit, 1 otherwise.\n" +
        "See docs/editors.md for editor set-up.";

    /// <summary>The arguments an editor launches the server with; only these skip the command-line parser.</summary>
    public static bool IsServerLaunch(string[] args) => args is ["lsp"] or ["lsp", "--stdio"];

    public static Command Create()
    {
        var stdio = new Option<bool>("--stdio") { Description = "Use standard input and output (the default and only transport)", Arity = ArgumentArity.Zero };
        var command = new Command("lsp", "Run the language server for editors (over standard input and output)") { stdio };
        command.SetAction(_ => RunOverStdio());
        return command;
    }

    public static int RunOverStdio()
    {
        var output = Console.OpenStandardOutput();
        var input = Console.OpenStandardInput();
        Console.SetOut(Console.Error);
        return LanguageServerHost.RunAsync(input, output, Console.Error).GetAwaiter().GetResult();
    }
}
