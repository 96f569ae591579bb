using System.Buffers;
using System.Text;
using System.Text.Json;
using CutSheet.LanguageServer.Protocol;
using StreamJsonRpc;
using StreamJsonRpc.Protocol;

namespace CutSheet.LanguageServer.Transport;

/// <summary>
/// StreamJsonRpc's System.Text.Json formatter, with one change: a body it cannot read becomes an
/// <see cref="UnreadableMessageException"/> that says how to answer it (with the request's id
/// where the body has one), so <see cref="TolerantMessageHandler"/> can answer and read on.
/// </summary>
public sealed class LspFormatter : SystemTextJsonFormatter, IJsonRpcMessageFormatter, IJsonRpcMessageTextFormatter
{
    JsonRpcMessage IJsonRpcMessageFormatter.Deserialize(ReadOnlySequence<byte> contentBuffer) => Read(contentBuffer, Encoding.UTF8);

    JsonRpcMessage IJsonRpcMessageTextFormatter.Deserialize(ReadOnlySequence<byte> contentBuffer, Encoding encoding) => Read(contentBuffer, encoding);

    private JsonRpcMessage Read(ReadOnlySequence<byte> content, Encoding encoding)
    {
        try
        {
            return Deserialize(content, encoding);
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            throw Describe(content, e);
        }
    }

    private static UnreadableMessageException Describe(ReadOnlySequence<byte> content, Exception e)
    {
        try
        {
            using var document = JsonDocument.Parse(content);
            var root = document.RootElement;
            if (root.ValueKind == JsonValueKind.Object)
            {
                bool hasId = root.TryGetProperty("id", out var id);
                RequestId? requestId = !hasId ? null : id.ValueKind switch
                {
                    JsonValueKind.Number when id.TryGetInt64(out long n) => new RequestId(n),
                    JsonValueKind.String => new RequestId(id.GetString()),
                    _ => RequestId.Null,
                };
                bool notification = !hasId && root.TryGetProperty("method", out _);
                return new UnreadableMessageException(requestId, ErrorCodes.InvalidRequest, notification, e.Message, e);
            }
            return new UnreadableMessageException(null, ErrorCodes.InvalidRequest, false, e.Message, e);
        }
        catch (JsonException)
        {
            return new UnreadableMessageException(null, ErrorCodes.ParseError, false, e.Message, e);
        }
    }
}
