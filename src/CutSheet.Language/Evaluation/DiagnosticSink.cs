using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;

namespace CutSheet.Language.Evaluation;

/// <summary>Collects the diagnostics and fired cautions of the statement being evaluated.</summary>
internal sealed class DiagnosticSink
{
    public List<Diagnostic> Diagnostics { get; } = [];
    public List<CautionResult> Cautions { get; } = [];

    /// <summary>True when an error was reported since the last <see cref="BeginStatement"/>.</summary>
    public bool StatementHasError { get; private set; }

    public void BeginStatement()
    {
        StatementHasError = false;
        Cautions.Clear();
    }

    public void Report(Diagnostic diagnostic)
    {
        if (diagnostic.Severity == Severity.Error) StatementHasError = true;
        // One report per code and place: a formula evaluated twice (a branch check) must not repeat itself.
        foreach (var d in Diagnostics)
        {
            if (d.Code == diagnostic.Code && d.Span == diagnostic.Span && d.Message == diagnostic.Message && d.Path == diagnostic.Path) return;
        }
        Diagnostics.Add(diagnostic);
    }
}
