using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>initialized</c>: the client is ready; nothing to do until documents open.</summary>
public sealed class InitializedHandler : INotificationHandler<InitializedParams>
{
    public string Method => "initialized";

    public void Handle(InitializedParams parameters)
    {
        // The server pushes nothing unprompted: diagnostics follow didOpen.
    }
}
