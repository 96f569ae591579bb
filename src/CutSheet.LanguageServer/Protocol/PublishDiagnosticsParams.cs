namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/publishDiagnostics.</summary>
public sealed class PublishDiagnosticsParams
{
    public string Uri { get; set; } = "";
    public int? Version { get; set; }
    public Diagnostic[] Diagnostics { get; set; } = [];
}
