namespace CutSheet.LanguageServer.Protocol;

/// <summary>Markdown text.</summary>
public sealed class MarkupContent
{
    public string Kind { get; set; } = "markdown";
    public string Value { get; set; } = "";
}
