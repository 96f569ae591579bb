using CutSheet.Cli.Commands;
using CutSheet.Cli.Output;

namespace CutSheet.Cli.Evaluation;

/// <summary>
/// The outcome of <c>cutsheet check</c> over all its sheets: the evaluations in path order, the findings
/// with duplicates removed (a file imported by several checked sheets reports once), the totals and the exit code.
/// </summary>
internal sealed record CheckRun(
    IReadOnlyList<SheetEvaluation> Sheets,
    IReadOnlyList<Finding> Findings,
    SheetTally Tally,
    FailOn FailOn,
    int ExitCode,
    string WorkingDirectory)
{
    public static CheckRun From(IReadOnlyList<SheetEvaluation> sheets, FailOn failOn, string workingDirectory)
    {
        var seen = new HashSet<(string, SourceRange, string, string)>();
        var findings = sheets
            .SelectMany(s => s.Findings)
            .Where(f => seen.Add((f.FullPath, f.Range, f.Code, f.Message)))
            .ToList();
        var tally = SheetTally.Of(sheets.Select(s => s.Result).ToList(), findings);
        return new CheckRun(sheets, findings, tally, failOn, FailurePolicy.ForCheck(tally, failOn), workingDirectory);
    }
}
