namespace CutSheet.LanguageServer.Server;

/// <summary>Thrown by a handler to answer with a protocol error (a code and a message meant for the user), not a crash.</summary>
public sealed class RequestFailure(int code, string message) : Exception(message)
{
    public int Code { get; } = code;
}
