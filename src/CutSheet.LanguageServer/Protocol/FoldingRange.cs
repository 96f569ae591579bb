namespace CutSheet.LanguageServer.Protocol;

/// <summary>Lines that fold.</summary>
public sealed class FoldingRange
{
    public int StartLine { get; set; }
    public int EndLine { get; set; }
    public string? Kind { get; set; }
}
