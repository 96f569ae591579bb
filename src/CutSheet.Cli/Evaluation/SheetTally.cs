using CutSheet.Cli.Output;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Evaluation;

/// <summary>Counts of what one or more sheets produced, from which summaries and exit codes are made.</summary>
internal sealed record SheetTally
{
    public int Sheets { get; init; }
    public int Errors { get; init; }
    public int Warnings { get; init; }
    public int Infos { get; init; }
    public int ChecksPassed { get; init; }
    public int ChecksFailed { get; init; }
    public int ChecksNotEvaluated { get; init; }

    /// <summary>Cautions that fired, accepted or not.</summary>
    public int CautionsRaised { get; init; }

    public int CautionsAccepted { get; init; }

    /// <summary>Fired cautions the sheet has not accepted: the statements' cautions, or caution findings (CUT4101–CUT4104), whichever counts more.</summary>
    public int CautionsUnaccepted { get; init; }

    /// <summary>Tallies sheets with the given findings (which the caller may have de-duplicated across sheets).</summary>
    public static SheetTally Of(IReadOnlyList<SheetResult> results, IEnumerable<Finding> findings)
    {
        var list = findings.ToList();
        var checks = results.SelectMany(r => r.Checks).ToList();
        var cautions = results.SelectMany(r => r.Cautions).ToList();
        int cautionFindings = list.Count(f => CautionCodes.IsUnaccepted(f.Code));
        return new SheetTally
        {
            Sheets = results.Count,
            Errors = list.Count(f => f.Severity == Severity.Error),
            Warnings = list.Count(f => f.Severity == Severity.Warning),
            Infos = list.Count(f => f.Severity == Severity.Information),
            ChecksPassed = checks.Count(c => c.Status == CheckStatus.Passed),
            ChecksFailed = checks.Count(c => c.Status == CheckStatus.Failed),
            ChecksNotEvaluated = checks.Count(c => c.Status == CheckStatus.NotEvaluated),
            CautionsRaised = cautions.Count,
            CautionsAccepted = cautions.Count(c => c.IsAccepted),
            CautionsUnaccepted = Math.Max(cautions.Count(c => !c.IsAccepted), cautionFindings),
        };
    }

    public static SheetTally Of(SheetEvaluation evaluation) => Of([evaluation.Result], evaluation.Findings);

    /// <summary>True when a check failed or could not be evaluated: either way the sheet does not prove what it claims.</summary>
    public bool HasUnprovenChecks => ChecksFailed > 0 || ChecksNotEvaluated > 0;

    /// <summary>True when the safety notice belongs under the output.</summary>
    public bool NeedsSafetyNotice => CautionsRaised > 0 || HasUnprovenChecks;
}
