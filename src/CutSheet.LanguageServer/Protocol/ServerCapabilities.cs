namespace CutSheet.LanguageServer.Protocol;

/// <summary>What the server does; a feature not listed here is not offered.</summary>
public sealed class ServerCapabilities
{
    public string? PositionEncoding { get; set; }
    public TextDocumentSyncOptions? TextDocumentSync { get; set; }
    public bool? HoverProvider { get; set; }
    public CompletionOptions? CompletionProvider { get; set; }
    public SignatureHelpOptions? SignatureHelpProvider { get; set; }
    public bool? DefinitionProvider { get; set; }
    public bool? ReferencesProvider { get; set; }
    public RenameOptions? RenameProvider { get; set; }
    public bool? DocumentSymbolProvider { get; set; }
    public SemanticTokensOptions? SemanticTokensProvider { get; set; }
    public CodeActionOptions? CodeActionProvider { get; set; }
    public bool? DocumentFormattingProvider { get; set; }
    public bool? FoldingRangeProvider { get; set; }
    public bool? InlayHintProvider { get; set; }
    public CodeLensOptions? CodeLensProvider { get; set; }
}
