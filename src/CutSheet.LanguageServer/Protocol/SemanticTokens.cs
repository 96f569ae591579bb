namespace CutSheet.LanguageServer.Protocol;

/// <summary>Semantic tokens, five integers each (relative line, start, length, type, modifiers).</summary>
public sealed class SemanticTokens
{
    public int[] Data { get; set; } = [];
}
