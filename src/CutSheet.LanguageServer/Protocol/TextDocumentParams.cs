namespace CutSheet.LanguageServer.Protocol;

/// <summary>Requests about a whole document (symbols, semantic tokens, folding, code lens).</summary>
public sealed class TextDocumentParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
}
