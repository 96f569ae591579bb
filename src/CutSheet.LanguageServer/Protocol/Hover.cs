namespace CutSheet.LanguageServer.Protocol;

/// <summary>A hover result.</summary>
public sealed class Hover
{
    public MarkupContent Contents { get; set; } = new();
    public Range? Range { get; set; }
}
