namespace CutSheet.LanguageServer.Protocol;

/// <summary>workspace/didChangeWatchedFiles.</summary>
public sealed class DidChangeWatchedFilesParams
{
    public FileEvent[] Changes { get; set; } = [];
}
