namespace CutSheet.LanguageServer.Protocol;

/// <summary>A diagnostic as the protocol carries it.</summary>
public sealed class Diagnostic
{
    public Range Range { get; set; } = new();
    public int? Severity { get; set; }
    public string? Code { get; set; }
    public string? Source { get; set; }
    public string Message { get; set; } = "";
    public DiagnosticRelatedInformation[]? RelatedInformation { get; set; }
}
