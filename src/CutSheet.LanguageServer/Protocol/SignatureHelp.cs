namespace CutSheet.LanguageServer.Protocol;

/// <summary>textDocument/signatureHelp result.</summary>
public sealed class SignatureHelp
{
    public SignatureInformation[] Signatures { get; set; } = [];
    public int ActiveSignature { get; set; }
    public int ActiveParameter { get; set; }
}
