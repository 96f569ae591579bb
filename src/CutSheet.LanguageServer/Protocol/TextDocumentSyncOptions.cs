namespace CutSheet.LanguageServer.Protocol;

/// <summary>Open/close notifications and incremental changes (2).</summary>
public sealed class TextDocumentSyncOptions
{
    public bool OpenClose { get; set; }
    public int Change { get; set; }
    public SaveOptions? Save { get; set; }
}
