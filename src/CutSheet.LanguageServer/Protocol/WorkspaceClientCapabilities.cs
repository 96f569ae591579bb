namespace CutSheet.LanguageServer.Protocol;

/// <summary>The workspace features of the client the server reads: refresh requests.</summary>
public sealed class WorkspaceClientCapabilities
{
    public RefreshCapability? InlayHint { get; set; }
    public RefreshCapability? CodeLens { get; set; }
    public DynamicRegistrationCapability? DidChangeWatchedFiles { get; set; }
}
