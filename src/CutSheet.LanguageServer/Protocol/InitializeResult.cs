namespace CutSheet.LanguageServer.Protocol;

/// <summary>initialize result.</summary>
public sealed class InitializeResult
{
    public ServerCapabilities Capabilities { get; set; } = new();
    public ServerInfo? ServerInfo { get; set; }
}
