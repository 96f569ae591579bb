namespace CutSheet.LanguageServer.Server;

/// <summary>
/// The guard around every notification: none is answered, so a failure is logged and the
/// server carries on. Notifications before <c>initialize</c> are dropped (except <c>exit</c>).
/// </summary>
public sealed class NotificationGuard<TParams>(INotificationHandler<TParams> handler, ServerState state, ServerLog log)
    where TParams : class
{
    public string Method => handler.Method;

    public void Invoke(TParams parameters)
    {
        if (state.Phase == SessionPhase.Created && Method != "exit") return;
        if (parameters is null)
        {
            log.Warning(ServerMessages.NotificationWithoutParams(Method));
            return;
        }
        try
        {
            handler.Handle(parameters);
        }
        catch (Exception e)
        {
            log.Error(ServerMessages.HandlerFailed(Method, e) + Environment.NewLine + e.StackTrace);
        }
    }
}
