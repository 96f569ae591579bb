namespace CutSheet.LanguageServer.Protocol;

/// <summary>Another place that explains a diagnostic.</summary>
public sealed class DiagnosticRelatedInformation
{
    public Location Location { get; set; } = new();
    public string Message { get; set; } = "";
}
