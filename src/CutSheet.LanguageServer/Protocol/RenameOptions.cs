namespace CutSheet.LanguageServer.Protocol;

/// <summary>Rename capability with prepareRename.</summary>
public sealed class RenameOptions
{
    public bool PrepareProvider { get; set; }
}
