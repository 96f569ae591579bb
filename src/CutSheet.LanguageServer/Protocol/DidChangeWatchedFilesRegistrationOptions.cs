namespace CutSheet.LanguageServer.Protocol;

/// <summary>The files to watch.</summary>
public sealed class DidChangeWatchedFilesRegistrationOptions
{
    public FileSystemWatcher[] Watchers { get; set; } = [];
}
