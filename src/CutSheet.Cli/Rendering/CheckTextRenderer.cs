using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Output;

namespace CutSheet.Cli.Rendering;

/// <summary>The text output of <c>cutsheet check</c>: one line per finding, then one summary line.</summary>
internal static class CheckTextRenderer
{
    public static void Write(TextWriter output, IReadOnlyList<Finding> findings, SheetTally tally, Painter painter)
    {
        foreach (var finding in findings) output.WriteLine(FindingLineFormatter.Format(finding, painter));
        output.WriteLine(Summary(tally));
        if (tally.NeedsSafetyNotice) output.WriteLine(painter.Paint(SafetyNotice.Text, Tone.Attention));
    }

    public static string Summary(SheetTally t)
    {
        string summary =
            $"{Words.Count(t.Sheets, "sheet", "sheets")} checked: " +
            $"{Words.Count(t.Errors, "error", "errors")}, {Words.Count(t.Warnings, "warning", "warnings")}, {Words.Count(t.Infos, "info")}, " +
            $"{Words.Count(t.ChecksFailed, "failed check", "failed checks")}";
        if (t.ChecksNotEvaluated > 0) summary += ", " + Words.Count(t.ChecksNotEvaluated, "check not evaluated", "checks not evaluated");
        if (t.CautionsUnaccepted > 0) summary += ", " + Words.Count(t.CautionsUnaccepted, "unaccepted caution", "unaccepted cautions");
        return summary;
    }
}
