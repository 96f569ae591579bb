using System.Text.Json;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>initialize.</summary>
public sealed class InitializeParams
{
    public int? ProcessId { get; set; }
    public string? RootUri { get; set; }
    public string? RootPath { get; set; }
    public ClientCapabilities? Capabilities { get; set; }
    public JsonElement? InitializationOptions { get; set; }
    public WorkspaceFolder[]? WorkspaceFolders { get; set; }
}
