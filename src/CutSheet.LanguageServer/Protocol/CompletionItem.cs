namespace CutSheet.LanguageServer.Protocol;

/// <summary>One completion.</summary>
public sealed class CompletionItem
{
    public string Label { get; set; } = "";
    public int? Kind { get; set; }
    public string? Detail { get; set; }
    public MarkupContent? Documentation { get; set; }
    public string? SortText { get; set; }
    public string? FilterText { get; set; }
    public TextEdit? TextEdit { get; set; }
}
