namespace CutSheet.LanguageServer.Protocol;

/// <summary>How completion was asked for: by hand (1), by a trigger character (2), or again while incomplete (3).</summary>
public sealed class CompletionContext
{
    public int TriggerKind { get; set; }
    public string? TriggerCharacter { get; set; }
}
