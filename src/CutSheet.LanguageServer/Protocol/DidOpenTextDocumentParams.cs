namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/didOpen.</summary>
public sealed class DidOpenTextDocumentParams
{
    public TextDocumentItem TextDocument { get; set; } = new();
}
