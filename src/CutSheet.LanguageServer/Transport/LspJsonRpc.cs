using System.Text.Json;
using CutSheet.LanguageServer.Protocol;
using StreamJsonRpc;
using StreamJsonRpc.Protocol;

namespace CutSheet.LanguageServer.Transport;

/// <summary>
/// The JSON-RPC connection with its error answers shaped: StreamJsonRpc would send the .NET
/// exception type and stack trace as error data. Here a guard's answer goes out as it was
/// made, parameters that do not fit the method's types are "invalid params", and anything
/// else is "internal error" with a plain message — never with data.
/// </summary>
public sealed class LspJsonRpc(IJsonRpcMessageHandler handler) : JsonRpc(handler)
{
    protected override JsonRpcError.ErrorDetail CreateErrorDetails(JsonRpcRequest request, Exception exception)
    {
        var inner = exception is AggregateException { InnerExceptions.Count: 1 } a ? a.InnerExceptions[0] : exception;
        return inner switch
        {
            LocalRpcException local => new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)local.ErrorCode, Message = local.Message },
            JsonException or FormatException or InvalidCastException or ArgumentException or RpcArgumentDeserializationException =>
                new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)ErrorCodes.InvalidParams, Message = ServerMessages.InvalidParams(request.Method ?? "?", inner.Message) },
            _ => new JsonRpcError.ErrorDetail { Code = (JsonRpcErrorCode)ErrorCodes.InternalError, Message = ServerMessages.InternalError },
        };
    }
}
