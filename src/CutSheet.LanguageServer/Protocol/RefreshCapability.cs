namespace CutSheet.LanguageServer.Protocol;

/// <summary>Whether the client accepts a server's request to refresh a feature (inlay hints, code lenses).</summary>
public sealed class RefreshCapability
{
    public bool RefreshSupport { get; set; }
}
