namespace CutSheet.LanguageServer.Protocol;

/// <summary>didSave: the server reads the text it already has.</summary>
public sealed class SaveOptions
{
    public bool IncludeText { get; set; }
}
