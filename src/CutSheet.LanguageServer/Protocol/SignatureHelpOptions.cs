namespace CutSheet.LanguageServer.Protocol;

/// <summary>Signature help capability.</summary>
public sealed class SignatureHelpOptions
{
    public string[]? TriggerCharacters { get; set; }
    public string[]? RetriggerCharacters { get; set; }
}
