namespace CutSheet.Language.Diagnostics;

/// <summary>How serious a finding is. Errors make a value unknown; the others only inform.</summary>
public enum Severity
{
    Error,
    Warning,
    Information,
}
