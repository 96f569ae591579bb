namespace CutSheet.LanguageServer.Protocol;

/// <summary>A position in a document (hover, definition, signature help, prepareRename).</summary>
public sealed class TextDocumentPositionParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Position Position { get; set; } = new();
}
