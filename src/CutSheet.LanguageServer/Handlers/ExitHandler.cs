using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>exit</c> (no parameters): end the process, with 0 after a shutdown and 1 without one.</summary>
public sealed class ExitHandler(ServerContext context)
{
    public const string Method = "exit";

    public void Exit() => context.State.Exit();
}
