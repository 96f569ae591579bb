using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Cautions as diagnostics: a notice is information, a caution and a warning are warnings (the
/// signal word leads the message, after ISO 3864-2); an accepted caution is information that
/// keeps its reason.
/// </summary>
internal static class CautionDiagnostics
{
    public static Diagnostic For(CautionResult c)
    {
        string message = DiagnosticMessages.Caution(c.Level, c.Message);
        if (c.IsAccepted)
            return Diagnostic.Info(DiagnosticCodes.CautionAccepted, c.Span, DiagnosticMessages.CautionAccepted(message, c.AcceptedReason!));
        string code = c.Code ?? c.Level switch
        {
            CautionLevel.Notice => DiagnosticCodes.NoticeRaised,
            CautionLevel.Warning => DiagnosticCodes.WarningRaised,
            _ => DiagnosticCodes.CautionRaised,
        };
        return Diagnostic.Create(code, c.Level == CautionLevel.Notice ? Severity.Information : Severity.Warning, c.Span, message);
    }
}
