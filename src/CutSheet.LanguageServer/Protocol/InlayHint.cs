namespace CutSheet.LanguageServer.Protocol;

/// <summary>A label in the text.</summary>
public sealed class InlayHint
{
    public Position Position { get; set; } = new();
    public string Label { get; set; } = "";
    public bool? PaddingLeft { get; set; }
    public bool? PaddingRight { get; set; }
    public MarkupContent? Tooltip { get; set; }
}
