namespace CutSheet.LanguageServer.Protocol;

/// <summary>Requests about a range of a document (inlay hints).</summary>
public sealed class RangeParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Range Range { get; set; } = new();
}
