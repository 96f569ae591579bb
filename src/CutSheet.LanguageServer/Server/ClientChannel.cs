using StreamJsonRpc;

namespace CutSheet.LanguageServer.Server;

/// <summary>Notifications from the server to the client; a closed connection drops them quietly.</summary>
public sealed class ClientChannel(JsonRpc rpc, TextWriter stderr)
{
    public void Notify(string method, object parameters) => _ = NotifyAsync(method, parameters);

    /// <summary>Sends a request without parameters (the refresh requests) and does not wait for or need its answer.</summary>
    public void Request(string method, object? parameters = null) => _ = RequestAsync(method, parameters);

    private async Task RequestAsync(string method, object? parameters)
    {
        try
        {
            await rpc.InvokeWithParameterObjectAsync(method, parameters).ConfigureAwait(false);
        }
        catch (Exception e) when (e is RemoteInvocationException or ConnectionLostException or ObjectDisposedException or IOException or OperationCanceledException)
        {
            await stderr.WriteLineAsync("[cutsheet warning] " + ServerMessages.NotAnswered(method, e.Message)).ConfigureAwait(false);
        }
    }

    public async Task NotifyAsync(string method, object parameters)
    {
        try
        {
            // The object form: LSP params are one object, not an array.
            await rpc.NotifyWithParameterObjectAsync(method, parameters).ConfigureAwait(false);
        }
        catch (Exception e) when (e is ConnectionLostException or ObjectDisposedException or IOException or OperationCanceledException)
        {
            await stderr.WriteLineAsync("[cutsheet warning] " + ServerMessages.NotSent(method, e.Message)).ConfigureAwait(false);
        }
    }
}
