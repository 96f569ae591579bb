using CutSheet.Cli.Evaluation;
using CutSheet.Language.Display;

namespace CutSheet.Cli.Rendering;

/// <summary>
/// The text output of <c>cutsheet run</c>: a header, the aligned results listing, the diagnostics,
/// a summary line and, when a caution fired or a check did not pass, the safety notice.
/// </summary>
internal static class RunTextRenderer
{
    public static void Write(TextWriter output, SheetEvaluation evaluation, SheetTally tally, Painter painter)
    {
        WriteHeader(output, evaluation, painter);

        var listing = ResultListingBuilder.Build(evaluation);
        if (listing.Count > 0)
        {
            output.WriteLine();
            ListingLayout.Write(output, listing, painter);
        }

        if (evaluation.Findings.Count > 0)
        {
            output.WriteLine();
            foreach (var finding in evaluation.Findings) output.WriteLine(FindingLineFormatter.Format(finding, painter));
        }

        output.WriteLine();
        output.WriteLine(Summary(tally));
        if (tally.NeedsSafetyNotice) output.WriteLine(painter.Paint(SafetyNotice.Text, Tone.Attention));
    }

    private static void WriteHeader(TextWriter output, SheetEvaluation evaluation, Painter painter)
    {
        var result = evaluation.Result;
        if (result.Metadata.TryGetValue("title", out var title)) output.WriteLine(painter.Paint(title, Tone.Strong));
        string digits = Words.Count(result.Display.Digits, "significant figure", "significant figures");
        string units = result.Display.Units switch
        {
            UnitSystem.Inch => "inch units",
            UnitSystem.Both => "metric and inch units",
            _ => "metric units",
        };
        output.WriteLine(painter.Paint($"{evaluation.File.DisplayPath}  ({units}, {digits})", Tone.Faint));
        foreach (var (key, value) in result.Metadata.OrderBy(m => m.Key, StringComparer.Ordinal))
        {
            if (key != "title") output.WriteLine($"{key}: {value}");
        }
        foreach (var (name, value) in evaluation.Overrides.OrderBy(o => o.Key, StringComparer.Ordinal))
        {
            output.WriteLine($"set: {name} = {value}");
        }
    }

    private static string Summary(SheetTally t) =>
        $"Checks: {t.ChecksPassed} passed, {t.ChecksFailed} failed, {t.ChecksNotEvaluated} not evaluated; " +
        $"cautions: {t.CautionsRaised} raised, {t.CautionsAccepted} accepted; " +
        $"{Words.Count(t.Errors, "error", "errors")}, {Words.Count(t.Warnings, "warning", "warnings")}, {Words.Count(t.Infos, "info")}.";
}
