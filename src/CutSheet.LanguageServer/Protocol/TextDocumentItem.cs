namespace CutSheet.LanguageServer.Protocol;

/// <summary>An opened document with its text.</summary>
public sealed class TextDocumentItem
{
    public string Uri { get; set; } = "";
    public string LanguageId { get; set; } = "";
    public int Version { get; set; }
    public string Text { get; set; } = "";
}
