namespace CutSheet.Language.Tests.Messages;

/// <summary>A sheet, the diagnostic code it must produce, and the exact message, taken from DiagnosticMessages.</summary>
public sealed record DiagnosticMessageCase(string Name, string Sheet, string Code, string Message)
{
    public override string ToString() => Name;
}
