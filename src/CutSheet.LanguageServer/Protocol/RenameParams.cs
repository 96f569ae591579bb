namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/rename.</summary>
public sealed class RenameParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Position Position { get; set; } = new();
    public string NewName { get; set; } = "";
}
