namespace CutSheet.LanguageServer.Protocol;

/// <summary>A place in a document: zero-based line and character (in the negotiated encoding's units).</summary>
public sealed class Position
{
    public int Line { get; set; }
    public int Character { get; set; }
}
