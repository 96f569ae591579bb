namespace CutSheet.LanguageServer.Protocol;

/// <summary>The range to rename and the text shown to edit.</summary>
public sealed class PrepareRenameResult
{
    public Range Range { get; set; } = new();
    public string Placeholder { get; set; } = "";
}
