using CutSheet.LanguageServer.Protocol;
using StreamJsonRpc;

namespace CutSheet.LanguageServer.Server;

/// <summary>
/// The one guard around every request: it answers requests that come before
/// <c>initialize</c> or after <c>shutdown</c> with the protocol's errors, turns a handler's
/// exception into a logged error and an error answer without a stack trace, and lets a
/// cancelled request end as cancelled. No exception ever reaches the connection.
/// </summary>
public sealed class RequestGuard<TParams, TResult>(IRequestHandler<TParams, TResult> handler, ServerState state, ServerLog log)
    where TParams : class
{
    public string Method => handler.Method;

    public async Task<TResult?> InvokeAsync(TParams parameters, CancellationToken cancellation)
    {
        Admit(Method, state);
        if (parameters is null) throw Answer(ErrorCodes.InvalidParams, ServerMessages.MissingParams(Method));
        try
        {
            return await handler.HandleAsync(parameters, cancellation).ConfigureAwait(false);
        }
        catch (OperationCanceledException) when (cancellation.IsCancellationRequested)
        {
            throw;
        }
        catch (RequestFailure failure)
        {
            throw Answer(failure.Code, failure.Message);
        }
        catch (Exception e)
        {
            log.Error(ServerMessages.HandlerFailed(Method, e) + Environment.NewLine + e.StackTrace);
            throw Answer(ErrorCodes.InternalError, ServerMessages.InternalError);
        }
    }

    /// <summary>Requests are served only between initialize and shutdown.</summary>
    public static void Admit(string method, ServerState state)
    {
        if (method == "initialize")
        {
            if (state.Phase != SessionPhase.Created) throw Answer(ErrorCodes.InvalidRequest, ServerMessages.AlreadyInitialized);
            return;
        }
        if (state.Phase == SessionPhase.Created) throw Answer(ErrorCodes.ServerNotInitialized, ServerMessages.NotInitialized);
        if (state.Phase == SessionPhase.ShutDown) throw Answer(ErrorCodes.InvalidRequest, ServerMessages.ShuttingDown);
    }

    /// <summary>An error answer with a message and no data: no exception type, no stack.</summary>
    public static LocalRpcException Answer(int code, string message) => new(message) { ErrorCode = code, ErrorData = null };
}
