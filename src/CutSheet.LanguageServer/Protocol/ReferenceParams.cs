namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/references.</summary>
public sealed class ReferenceParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Position Position { get; set; } = new();
    public ReferenceContext Context { get; set; } = new();
}
