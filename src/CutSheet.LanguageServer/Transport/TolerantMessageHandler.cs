using System.IO.Pipelines;
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
public sealed class TolerantMessageHandler(Stream output, Stream input, IJsonRpcMessageFormatter formatter, ServerLog log)
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
            catch (Exception e) when (IsBadBody(e))
            {
                log.Warning(ServerMessages.DroppedMessage(e.GetBaseException().Message));
                var error = new JsonRpcError
                {
                    RequestId = RequestId.Null,
                    Error = new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)ErrorCodes.ParseError, Message = ServerMessages.BadMessage },
                };
                await WriteAsync(error, cancellationToken).ConfigureAwait(false);
            }
        }
    }

    /// <summary>A body that is not JSON, or not a JSON-RPC message; a broken header or stream is not one.</summary>
    private static bool IsBadBody(Exception e) =>
        e is System.Text.Json.JsonException or FormatException or InvalidCastException or NotSupportedException
            or KeyNotFoundException or InvalidOperationException or ArgumentException
        && e is not BadRpcHeaderException;
}
