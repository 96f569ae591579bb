namespace CutSheet.LanguageServer.Protocol;

/// <summary>Names a document at a version.</summary>
public sealed class VersionedTextDocumentIdentifier
{
    public string Uri { get; set; } = "";
    public int Version { get; set; }
}
