namespace CutSheet.LanguageServer.Protocol;

/// <summary>Completions; incomplete lists are asked for again as the user types.</summary>
public sealed class CompletionList
{
    public bool IsIncomplete { get; set; }
    public CompletionItem[] Items { get; set; } = [];
}
