using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>workspace/didChangeConfiguration</c>: new value-hint settings; the next hint or lens request uses them.</summary>
public sealed class DidChangeConfigurationHandler(ServerContext context) : INotificationHandler<DidChangeConfigurationParams>
{
    public string Method => "workspace/didChangeConfiguration";

    public void Handle(DidChangeConfigurationParams p)
    {
        context.State.Settings = context.State.Settings.Merge(p.Settings);
        context.Scheduler.RefreshViews();
    }
}
