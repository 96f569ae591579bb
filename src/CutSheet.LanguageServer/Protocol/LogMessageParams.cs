namespace CutSheet.LanguageServer.Protocol;

/// <summary>window/logMessage.</summary>
public sealed class LogMessageParams
{
    public int Type { get; set; }
    public string Message { get; set; } = "";
}
