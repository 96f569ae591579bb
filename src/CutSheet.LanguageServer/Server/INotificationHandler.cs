namespace CutSheet.LanguageServer.Server;

/// <summary>
/// A notification of the protocol. Handled synchronously: the next message is dispatched only
/// when this returns, so document changes apply in the order they were sent.
/// </summary>
public interface INotificationHandler<in TParams>
{
    string Method { get; }

    void Handle(TParams parameters);
}
