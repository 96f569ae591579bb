namespace CutSheet.LanguageServer.Protocol;

/// <summary>Replace a range with text.</summary>
public sealed class TextEdit
{
    public Range Range { get; set; } = new();
    public string NewText { get; set; } = "";
}
