namespace CutSheet.LanguageServer.Protocol;

/// <summary>A quick fix.</summary>
public sealed class CodeAction
{
    public string Title { get; set; } = "";
    public string? Kind { get; set; }
    public Diagnostic[]? Diagnostics { get; set; }
    public bool? IsPreferred { get; set; }
    public WorkspaceEdit? Edit { get; set; }
}
