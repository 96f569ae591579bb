using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>initialized</c>: where the client can, ask it to watch sheets on disk, so that a sheet
/// changed outside the editor re-evaluates the open sheets that import it.
/// </summary>
public sealed class InitializedHandler(ServerContext context) : INotificationHandler<InitializedParams>
{
    public string Method => "initialized";

    public void Handle(InitializedParams parameters)
    {
        if (!context.State.ClientWatchesFiles) return;
        context.Scheduler.Client?.Request("client/registerCapability", new RegistrationParams
        {
            Registrations =
            [
                new Registration
                {
                    Id = "cutsheet-sheets-on-disk",
                    Method = "workspace/didChangeWatchedFiles",
                    RegisterOptions = new DidChangeWatchedFilesRegistrationOptions { Watchers = [new Protocol.FileSystemWatcher { GlobPattern = "**/*.cutsheet" }] },
                },
            ],
        });
    }
}
