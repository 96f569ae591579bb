using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Output;

/// <summary>The words severities are written with: in text and JSON (error, warning, info) and in SARIF (error, warning, note).</summary>
internal static class SeverityNames
{
    public static string Word(Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "info",
    };

    public static string SarifLevel(Severity severity) => severity switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "note",
    };
}
