namespace CutSheet.LanguageServer.Protocol;

/// <summary>Completion capability.</summary>
public sealed class CompletionOptions
{
    public string[]? TriggerCharacters { get; set; }
    public bool ResolveProvider { get; set; }
}
