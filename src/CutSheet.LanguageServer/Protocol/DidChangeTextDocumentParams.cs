namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/didChange.</summary>
public sealed class DidChangeTextDocumentParams
{
    public VersionedTextDocumentIdentifier TextDocument { get; set; } = new();
    public TextDocumentContentChangeEvent[] ContentChanges { get; set; } = [];
}
