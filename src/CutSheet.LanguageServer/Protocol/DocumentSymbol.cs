namespace CutSheet.LanguageServer.Protocol;

/// <summary>An outline entry.</summary>
public sealed class DocumentSymbol
{
    public string Name { get; set; } = "";
    public string? Detail { get; set; }
    public int Kind { get; set; }
    public Range Range { get; set; } = new();
    public Range SelectionRange { get; set; } = new();
    public DocumentSymbol[]? Children { get; set; }
}
