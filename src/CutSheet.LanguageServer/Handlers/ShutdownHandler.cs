using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>shutdown</c> (no parameters): stop taking requests; <c>exit</c> follows.</summary>
public sealed class ShutdownHandler(ServerContext context)
{
    public const string Method = "shutdown";

    public Task<object?> ShutdownAsync(CancellationToken cancellation)
    {
        RequestGuard<object, object>.Admit(Method, context.State);
        context.State.Phase = SessionPhase.ShutDown;
        foreach (var d in context.Documents.All) d.Close();
        return Task.FromResult<object?>(null);
    }
}
