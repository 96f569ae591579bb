namespace CutSheet.LanguageServer.Protocol;

/// <summary>Semantic tokens capability: whole documents only.</summary>
public sealed class SemanticTokensOptions
{
    public SemanticTokensLegend Legend { get; set; } = new();
    public bool Full { get; set; }
}
