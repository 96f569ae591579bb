namespace CutSheet.LanguageServer.Protocol;

/// <summary>A range in a document.</summary>
public sealed class Location
{
    public string Uri { get; set; } = "";
    public Range Range { get; set; } = new();
}
