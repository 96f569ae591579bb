namespace CutSheet.LanguageServer.Protocol;

/// <summary>A half-open range of positions.</summary>
public sealed class Range
{
    public Position Start { get; set; } = new();
    public Position End { get; set; } = new();
}
