namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/completion.</summary>
public sealed class CompletionParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Position Position { get; set; } = new();
    public CompletionContext? Context { get; set; }
}
