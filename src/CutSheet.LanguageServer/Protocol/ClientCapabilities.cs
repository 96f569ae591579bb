namespace CutSheet.LanguageServer.Protocol;

/// <summary>What the client supports, as far as the server reads it.</summary>
public sealed class ClientCapabilities
{
    public GeneralClientCapabilities? General { get; set; }
    public TextDocumentClientCapabilities? TextDocument { get; set; }
    public WorkspaceClientCapabilities? Workspace { get; set; }
}
