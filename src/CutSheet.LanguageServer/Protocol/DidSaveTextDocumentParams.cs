namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/didSave.</summary>
public sealed class DidSaveTextDocumentParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public string? Text { get; set; }
}
