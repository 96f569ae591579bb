namespace CutSheet.LanguageServer.Protocol;

/// <summary>One parameter of a signature.</summary>
public sealed class ParameterInformation
{
    public string Label { get; set; } = "";
}
