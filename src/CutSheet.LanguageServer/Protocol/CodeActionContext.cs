namespace CutSheet.LanguageServer.Protocol;

/// <summary>The diagnostics a code action request was made for.</summary>
public sealed class CodeActionContext
{
    public Diagnostic[] Diagnostics { get; set; } = [];
}
