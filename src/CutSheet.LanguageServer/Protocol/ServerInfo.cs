namespace CutSheet.LanguageServer.Protocol;

/// <summary>The server's name and version.</summary>
public sealed class ServerInfo
{
    public string Name { get; set; } = "";
    public string? Version { get; set; }
}
