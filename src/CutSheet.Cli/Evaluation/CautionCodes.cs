using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Evaluation;

/// <summary>The diagnostic codes by which the language reports cautions.</summary>
internal static class CautionCodes
{
    /// <summary>A raised notice, caution or warning, or a call outside a function's validity range, not accepted.</summary>
    public static bool IsUnaccepted(string code) => code is
        DiagnosticCodes.NoticeRaised or DiagnosticCodes.CautionRaised or DiagnosticCodes.WarningRaised or DiagnosticCodes.OutsideValidity;
}
