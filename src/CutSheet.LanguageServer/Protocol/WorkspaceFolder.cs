namespace CutSheet.LanguageServer.Protocol;

/// <summary>A workspace folder.</summary>
public sealed class WorkspaceFolder
{
    public string Uri { get; set; } = "";
    public string Name { get; set; } = "";
}
