namespace CutSheet.LanguageServer.Protocol;

/// <summary>Names a document.</summary>
public sealed class TextDocumentIdentifier
{
    public string Uri { get; set; } = "";
}
