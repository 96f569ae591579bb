namespace CutSheet.LanguageServer.Protocol;

/// <summary>Code action capability.</summary>
public sealed class CodeActionOptions
{
    public string[]? CodeActionKinds { get; set; }
}
