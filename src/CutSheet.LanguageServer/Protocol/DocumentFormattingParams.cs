namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/formatting.</summary>
public sealed class DocumentFormattingParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public FormattingOptions? Options { get; set; }
}
