namespace CutSheet.LanguageServer.Protocol;

/// <summary>A label over a line.</summary>
public sealed class CodeLens
{
    public Range Range { get; set; } = new();
    public Command? Command { get; set; }
}
