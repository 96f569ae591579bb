namespace CutSheet.LanguageServer.Protocol;

/// <summary>General client capabilities: the position encodings it accepts.</summary>
public sealed class GeneralClientCapabilities
{
    public string[]? PositionEncodings { get; set; }
}
