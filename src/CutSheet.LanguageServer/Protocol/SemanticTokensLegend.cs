namespace CutSheet.LanguageServer.Protocol;

/// <summary>The names behind token type and modifier numbers.</summary>
public sealed class SemanticTokensLegend
{
    public string[] TokenTypes { get; set; } = [];
    public string[] TokenModifiers { get; set; } = [];
}
