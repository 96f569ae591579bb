namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/didClose.</summary>
public sealed class DidCloseTextDocumentParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
}
