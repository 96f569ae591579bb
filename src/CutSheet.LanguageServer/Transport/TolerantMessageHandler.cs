using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;
using StreamJsonRpc;
using StreamJsonRpc.Protocol;

namespace CutSheet.LanguageServer.Transport;

/// <summary>
/// The LSP framing (<c>Content-Length</c> headers) over stdio, surviving a bad body: a message
/// whose JSON cannot be read is answered with a parse error (id null, as JSON-RPC asks) and
/// dropped, and reading goes on with the next message. A bad header cannot be survived (there
/// is no safe place to resume), so it ends the connection.
/// </summary>
public sealed class TolerantMessageHandler(Stream output, Stream input, LspFormatter formatter, ServerLog log)
    : HeaderDelimitedMessageHandler(output, input, formatter)
{
    protected override async ValueTask<JsonRpcMessage?> ReadCoreAsync(CancellationToken cancellationToken)
    {
        while (true)
        {
            try
            {
                return await base.ReadCoreAsync(cancellationToken).ConfigureAwait(false);
            }
            catch (UnreadableMessageException e)
            {
                log.Warning(ServerMessages.DroppedMessage(e.Message));
                if (e.IsNotification) continue;
                var error = new JsonRpcError
                {
                    RequestId = e.Id ?? RequestId.Null,
                    Error = new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)e.Code, Message = ServerMessages.BadMessage },
                };
                await WriteAsync(error, cancellationToken).ConfigureAwait(false);
            }
        }
    }
}
