namespace CutSheet.LanguageServer;

/// <summary>Every message the server writes (answers, log lines), in one place.</summary>
public static class ServerMessages
{
    public const string ServerName = "cutsheet";
    public const string NotInitialized = "the server is not initialized yet: send 'initialize' first";
    public const string AlreadyInitialized = "the server is already initialized";
    public const string ShuttingDown = "the server is shutting down and takes no more requests";
    public const string BadMessage = "the message is not valid JSON-RPC and was dropped";
    public const string InternalError = "the request failed inside the server; the details are in the server's log";

    public static string MissingParams(string method) => $"{method} needs its parameters";

    public static string NotificationWithoutParams(string method) => $"{method} arrived without parameters and was ignored";

    public static string NotSent(string method, string reason) => $"could not send {method}: {reason}";

    public static string NotAnswered(string method, string reason) => $"{method} was not answered: {reason}";

    public static string ConnectionEnded(string reason) => $"the connection ended: {reason}";

    public static string InvalidParams(string method, string detail) => $"the parameters of {method} do not fit: {detail}";

    public static string UnknownDocument(string uri) => $"the document {uri} is not open";

    public static string HandlerFailed(string method, Exception e) => $"{method} failed: {e.GetType().Name}: {e.Message}";

    public static string StaleChange(string uri, int version, int current) =>
        $"ignored a change to {uri} at version {version}: the document is already at version {current}";

    public static string EditClamped(string uri) => $"a change to {uri} reached past the end of the text; it was applied up to the end";

    public static string DroppedMessage(string reason) => $"dropped a message that could not be read: {reason}";

    public static string Started(string version, string encoding) => $"cutsheet language server {version} started; positions in {encoding}";

    public static string LibraryFolderFailed(string reason) => $"could not write the library sheets to disk: {reason}";
}
