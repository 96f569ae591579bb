namespace CutSheet.LanguageServer.Protocol;

/// <summary>One capability registered at run time.</summary>
public sealed class Registration
{
    public string Id { get; set; } = "";
    public string Method { get; set; } = "";
    public DidChangeWatchedFilesRegistrationOptions? RegisterOptions { get; set; }
}
