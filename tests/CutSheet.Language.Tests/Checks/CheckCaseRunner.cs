using System.Globalization;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using Xunit.Sdk;

namespace CutSheet.Language.Tests.Checks;

/// <summary>
/// Evaluates a <see cref="CheckCase"/> and tests each expectation (the forms are listed at the
/// top of <c>Cases/checks.cases</c>). Numbers are compared within 1e-9 relative (they are
/// hand-computed to that many figures at least) or 1e-12 absolute around zero.
/// </summary>
public static class CheckCaseRunner
{
    public static void Run(CheckCase c)
    {
        var result = SheetRunner.Run(c.Sheet);
        string context = $"{c.Where}: {c.Sheet.Replace("\n", "; ").TrimEnd(' ', ';')} ({c.Source})\n  diagnostics: " +
            string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Severity} {d.Message}"));
        foreach (var e in c.Expectations) Expect(result, e, context);
    }

    private static void Expect(SheetResult result, string e, string context)
    {
        var check = result.Checks.LastOrDefault();
        var last = result.Statements.LastOrDefault();
        if (e is "Passed" or "Failed" or "NotEvaluated")
        {
            That(check is not null, "there is no check", context);
            That(check!.Status.ToString() == e, $"status {check.Status}, expected {e}", context);
        }
        else if (e.StartsWith("u=", StringComparison.Ordinal))
        {
            That(check is not null, "there is no check", context);
            if (e == "u=none") That(check!.Utilisation is null, $"utilisation {check.Utilisation}, expected none", context);
            else That(check!.Utilisation is double u && Close(u, Number(e[2..])), $"utilisation {check.Utilisation}, expected {e[2..]}", context);
        }
        else if (e.StartsWith("margin=", StringComparison.Ordinal))
        {
            That(check is not null, "there is no check", context);
            string want = e["margin=".Length..];
            if (want == "none")
            {
                That(check!.Margin is null, $"margin {check.Margin?.Text}, expected none", context);
                return;
            }
            int space = want.IndexOf(' ');
            double number = Number(want[..space]);
            string unit = want[(space + 1)..];
            That(check!.Margin is { } m && m.Unit == unit && Close(m.Number, number),
                $"margin {check.Margin?.Number.ToString("R", CultureInfo.InvariantCulture)} {check.Margin?.Unit}, expected {want}", context);
        }
        else if (e.StartsWith("text=", StringComparison.Ordinal))
        {
            That(check is not null, "there is no check", context);
            That(check!.Text == e["text=".Length..], $"text '{check.Text}', expected '{e["text=".Length..]}'", context);
        }
        else if (e.StartsWith("!CUT", StringComparison.Ordinal))
        {
            That(result.Diagnostics.All(d => d.Code != e[1..]), $"unexpected {e[1..]}", context);
        }
        else if (e.StartsWith("CUT", StringComparison.Ordinal))
        {
            var (code, severity) = (e[..7], Enum.Parse<Severity>(e[8..]));
            That(result.Diagnostics.Any(d => d.Code == code && d.Severity == severity), $"no {code} with severity {severity}", context);
        }
        else if (e.StartsWith("caution=", StringComparison.Ordinal))
        {
            That(last is not null, "there is no statement", context);
            ExpectCaution(last!, e["caution=".Length..], context);
        }
        else if (e.StartsWith("fired=", StringComparison.Ordinal))
        {
            var statement = result.Statements.OfType<CautionStatementResult>().LastOrDefault();
            That(statement is not null, "there is no caution statement", context);
            string fired = statement!.Fired is bool b ? (b ? "true" : "false") : "unknown";
            That(fired == e["fired=".Length..], $"fired {fired}, expected {e["fired=".Length..]}", context);
        }
        else
        {
            throw new FormatException($"{context}: unknown expectation '{e}'");
        }
    }

    private static void ExpectCaution(StatementResult last, string want, string context)
    {
        if (want == "none")
        {
            That(last.Cautions.Count == 0, $"{last.Cautions.Count} caution(s) fired, expected none", context);
            return;
        }
        const string marker = " accepted=";
        int at = want.IndexOf(marker, StringComparison.Ordinal);
        string level = at < 0 ? want : want[..at];
        string? reason = at < 0 ? null : want[(at + marker.Length)..];
        That(last.Cautions.Count == 1, $"{last.Cautions.Count} caution(s) fired, expected one", context);
        var caution = last.Cautions[0];
        That(caution.Level.ToString() == level, $"level {caution.Level}, expected {level}", context);
        That(caution.IsAccepted == (reason is not null) && caution.AcceptedReason == reason,
            $"accepted reason '{caution.AcceptedReason}', expected '{reason}'", context);
    }

    private static bool Close(double actual, double expected) =>
        Math.Abs(actual - expected) <= Math.Max(1e-9 * Math.Abs(expected), 1e-12);

    private static double Number(string text) => double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);

    private static void That(bool condition, string message, string context)
    {
        if (!condition) throw new XunitException($"{context}\n  {message}");
    }
}
