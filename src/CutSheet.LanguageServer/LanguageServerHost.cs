using System.Diagnostics.CodeAnalysis;
using System.Diagnostics;
using System.Reflection;
using System.Text.Json;
using System.Text.Json.Serialization;
using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Handlers;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;
using CutSheet.LanguageServer.Transport;
using StreamJsonRpc;

namespace CutSheet.LanguageServer;

/// <summary>
/// Runs the language server on two streams (the process's stdin and stdout for
/// <c>cutsheet lsp</c>) until the client sends <c>exit</c> or the connection closes. Returns
/// the process exit code: 0 after shutdown and exit, 1 otherwise. Logs go to
/// <paramref name="log"/> (standard error), never to the protocol stream.
/// </summary>
public static class LanguageServerHost
{
    public static async Task<int> RunAsync(Stream input, Stream output, TextWriter log, LibraryFiles? library = null)
    {
        var serverLog = new ServerLog(log);
        var context = new ServerContext(serverLog, library ?? LibraryFiles.Default);

        var formatter = new LspFormatter();
        var options = formatter.JsonSerializerOptions;
        options.PropertyNamingPolicy = JsonNamingPolicy.CamelCase;
        options.DefaultIgnoreCondition = JsonIgnoreCondition.WhenWritingNull;
        options.TypeInfoResolverChain.Insert(0, ProtocolJsonContext.Default);

        using var rpc = new LspJsonRpc(new TolerantMessageHandler(output, input, formatter, serverLog));
        // The guards log every handler failure themselves; the library's own trace reports only what ends the connection.
        var trace = new TraceSource("cutsheet-lsp", SourceLevels.Critical);
        trace.Listeners.Clear();
        trace.Listeners.Add(new TextWriterTraceListener(log));
        rpc.TraceSource = trace;

        var client = new ClientChannel(rpc, log);
        serverLog.Client = client;
        context.Scheduler.Client = client;
        Register(rpc, context);

        rpc.StartListening();
        var finished = await Task.WhenAny(rpc.Completion, context.State.Exited).ConfigureAwait(false);
        if (finished == rpc.Completion && rpc.Completion.Exception is { } e)
            serverLog.Error(ServerMessages.ConnectionEnded(e.GetBaseException().Message));
        return context.State.Exited.IsCompleted ? await context.State.Exited.ConfigureAwait(false) : (context.State.Phase == SessionPhase.ShutDown ? 0 : 1);
    }

    private static void Register(JsonRpc rpc, ServerContext context)
    {
        Request(rpc, context, new InitializeHandler(context));
        Notification(rpc, context, new InitializedHandler(context));
        Notification(rpc, context, new DidOpenHandler(context));
        Notification(rpc, context, new DidChangeHandler(context));
        Notification(rpc, context, new DidCloseHandler(context));
        Notification(rpc, context, new DidSaveHandler(context));
        Notification(rpc, context, new DidChangeConfigurationHandler(context));
        Notification(rpc, context, new DidChangeWatchedFilesHandler(context));
        Request(rpc, context, new HoverHandler(context));
        Request(rpc, context, new CompletionHandler(context));
        Request(rpc, context, new CompletionResolveHandler(context));
        Request(rpc, context, new SignatureHelpHandler(context));
        Request(rpc, context, new DefinitionHandler(context));
        Request(rpc, context, new ReferencesHandler(context));
        Request(rpc, context, new PrepareRenameHandler(context));
        Request(rpc, context, new RenameHandler(context));
        Request(rpc, context, new DocumentSymbolHandler(context));
        Request(rpc, context, new SemanticTokensHandler(context));
        Request(rpc, context, new CodeActionHandler(context));
        Request(rpc, context, new FormattingHandler(context));
        Request(rpc, context, new FoldingRangeHandler(context));
        Request(rpc, context, new InlayHintHandler(context));
        Request(rpc, context, new CodeLensHandler(context));

        var shutdown = new ShutdownHandler(context);
        rpc.AddLocalRpcMethod(Method(typeof(ShutdownHandler), nameof(ShutdownHandler.ShutdownAsync)), shutdown, new JsonRpcMethodAttribute(ShutdownHandler.Method));
        var exit = new ExitHandler(context);
        rpc.AddLocalRpcMethod(Method(typeof(ExitHandler), nameof(ExitHandler.Exit)), exit, new JsonRpcMethodAttribute(ExitHandler.Method));
    }

    private static void Request<TParams, TResult>(JsonRpc rpc, ServerContext context, IRequestHandler<TParams, TResult> handler)
        where TParams : class
    {
        var guard = new RequestGuard<TParams, TResult>(handler, context.State, context.Log);
        rpc.AddLocalRpcMethod(Method(typeof(RequestGuard<TParams, TResult>), nameof(RequestGuard<TParams, TResult>.InvokeAsync)), guard,
            new JsonRpcMethodAttribute(handler.Method) { UseSingleObjectParameterDeserialization = true });
    }

    private static void Notification<TParams>(JsonRpc rpc, ServerContext context, INotificationHandler<TParams> handler)
        where TParams : class
    {
        var guard = new NotificationGuard<TParams>(handler, context.State, context.Log);
        rpc.AddLocalRpcMethod(Method(typeof(NotificationGuard<TParams>), nameof(NotificationGuard<TParams>.Invoke)), guard,
            new JsonRpcMethodAttribute(handler.Method) { UseSingleObjectParameterDeserialization = true });
    }

    /// <summary>
    /// A handler method by name. The annotation tells the trimmer to keep the public methods of the
    /// types named here, so the lookup also works in a Native AOT build.
    /// </summary>
    private static MethodInfo Method([DynamicallyAccessedMembers(DynamicallyAccessedMemberTypes.PublicMethods)] Type type, string name) =>
        type.GetMethod(name, BindingFlags.Public | BindingFlags.Instance)
        ?? throw new InvalidOperationException($"the handler method {type.Name}.{name} is missing");
}
