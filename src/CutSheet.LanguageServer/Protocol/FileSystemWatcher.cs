namespace CutSheet.LanguageServer.Protocol;

/// <summary>A glob of files the client watches for the server.</summary>
public sealed class FileSystemWatcher
{
    public string GlobPattern { get; set; } = "";
}
