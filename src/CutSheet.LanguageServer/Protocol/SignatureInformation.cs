namespace CutSheet.LanguageServer.Protocol;

/// <summary>One signature.</summary>
public sealed class SignatureInformation
{
    public string Label { get; set; } = "";
    public MarkupContent? Documentation { get; set; }
    public ParameterInformation[] Parameters { get; set; } = [];
    public int? ActiveParameter { get; set; }
}
