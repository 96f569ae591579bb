namespace CutSheet.LanguageServer.Protocol;

/// <summary>One change: a range replaced, or (no range) the whole text.</summary>
public sealed class TextDocumentContentChangeEvent
{
    public Range? Range { get; set; }
    public string Text { get; set; } = "";
}
