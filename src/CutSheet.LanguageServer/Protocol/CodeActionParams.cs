namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/codeAction.</summary>
public sealed class CodeActionParams
{
    public TextDocumentIdentifier TextDocument { get; set; } = new();
    public Range Range { get; set; } = new();
    public CodeActionContext? Context { get; set; }
}
