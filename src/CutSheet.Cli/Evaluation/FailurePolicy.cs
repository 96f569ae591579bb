using CutSheet.Cli.Commands;

namespace CutSheet.Cli.Evaluation;

/// <summary>Decides exit codes from tallies, in one place so that help texts, JSON and exit codes agree.</summary>
internal static class FailurePolicy
{
    /// <summary><c>run</c>: any error, or any check that failed or was not evaluated.</summary>
    public static int ForRun(SheetTally tally) =>
        tally.Errors > 0 || tally.HasUnprovenChecks ? ExitCodes.Findings : ExitCodes.Clean;

    /// <summary><c>check</c>: as <c>run</c>; at <see cref="FailOn.Caution"/> also any warning or unaccepted caution.</summary>
    public static int ForCheck(SheetTally tally, FailOn failOn)
    {
        if (tally.Errors > 0 || tally.HasUnprovenChecks) return ExitCodes.Findings;
        if (failOn == FailOn.Caution && (tally.Warnings > 0 || tally.CautionsUnaccepted > 0)) return ExitCodes.Findings;
        return ExitCodes.Clean;
    }
}
