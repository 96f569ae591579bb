using CutSheet.LanguageServer.Protocol;

namespace CutSheet.LanguageServer.Server;

/// <summary>
/// The server's log: standard error (never standard output, which carries only the protocol)
/// and, for errors and warnings, the client's log window once a connection exists.
/// </summary>
public sealed class ServerLog(TextWriter stderr)
{
    private readonly Lock _gate = new();

    public ClientChannel? Client { get; set; }

    public void Info(string message) => Write("info", message, null);

    public void Warning(string message) => Write("warning", message, ProtocolNumbers.LogWarning);

    public void Error(string message) => Write("error", message, ProtocolNumbers.LogError);

    private void Write(string level, string message, int? clientType)
    {
        lock (_gate)
        {
            stderr.WriteLine($"[cutsheet {level}] {message}");
            stderr.Flush();
        }
        if (clientType is { } type) Client?.Notify("window/logMessage", new LogMessageParams { Type = type, Message = message });
    }
}
