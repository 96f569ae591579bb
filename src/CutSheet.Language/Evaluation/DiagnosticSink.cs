using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;

namespace CutSheet.Language.Evaluation;

/// <summary>Collects the diagnostics and fired cautions of the statement being evaluated.</summary>
internal sealed class DiagnosticSink
{
    private readonly HashSet<(string Code, int Start, int Length, string Message, string? Path)> _seen = [];

    public List<Diagnostic> Diagnostics { get; } = [];
    public List<CautionResult> Cautions { get; } = [];

    /// <summary>True when an error was reported since the last <see cref="BeginStatement"/>.</summary>
    public bool StatementHasError { get; private set; }

    public void BeginStatement()
    {
        StatementHasError = false;
        if (Cautions.Count > 0) Cautions.Clear();
    }

    public void Report(Diagnostic diagnostic)
    {
        if (diagnostic.Severity == Severity.Error) StatementHasError = true;
        // One report per code and place: a formula evaluated twice (a branch check) must not repeat itself.
        if (!_seen.Add((diagnostic.Code, diagnostic.Span.Start, diagnostic.Span.Length, diagnostic.Message, diagnostic.Path))) return;
        Diagnostics.Add(diagnostic);
    }
}
