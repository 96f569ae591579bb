namespace CutSheet.LanguageServer.Protocol;

/// <summary>Edits per document URI.</summary>
public sealed class WorkspaceEdit
{
    public Dictionary<string, TextEdit[]> Changes { get; set; } = new();
}
