namespace CutSheet.LanguageServer.Protocol;

/// <summary>One file changed on disk (type 1 created, 2 changed, 3 deleted).</summary>
public sealed class FileEvent
{
    public string Uri { get; set; } = "";
    public int Type { get; set; }
}
