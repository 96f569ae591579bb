namespace CutSheet.LanguageServer.Protocol;

/// <summary>Code lens capability.</summary>
public sealed class CodeLensOptions
{
    public bool ResolveProvider { get; set; }
}
