using System.Globalization;
using System.Text;
using CutSheet.Language.Results;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// Everything a reader of a <see cref="SheetResult"/> sees, as text: each diagnostic (code,
/// severity, span, message, related locations, fixes) and each statement's displayed values,
/// check outcome and cautions. Two evaluations are "the same" when their snapshots are equal;
/// numbers that are not already text are written round-trip in the invariant culture, so the
/// snapshot itself never depends on the culture it is taken under.
/// </summary>
public static class ResultSnapshot
{
    public static string Of(SheetResult result)
    {
        var sb = new StringBuilder();
        foreach (var d in result.Diagnostics)
        {
            sb.Append($"{d.Code} {d.Severity} {d.Span} {d.Path} {d.Message}\n");
            foreach (var r in d.Related) sb.Append($"  related {r.Span} {r.Path} {r.Message}\n");
            foreach (var f in d.Fixes)
            {
                sb.Append($"  fix {f.Title}\n");
                foreach (var e in f.Edits) sb.Append($"    edit {e.Span} {e.Path} {e.NewText}\n");
            }
        }
        foreach (var s in result.Statements)
        {
            sb.Append($"{s.GetType().Name} line {s.Line} {s.Span}: ");
            switch (s)
            {
                case DefinitionResult d:
                    sb.Append($"{d.Name} = {Shown(d.Value)} kind {d.Kind} input {d.IsInput} assumed {d.IsAssumed} source {d.Source} description {d.Description}");
                    break;
                case CheckResult c:
                    sb.Append($"{c.Status} {c.Operator} value {Shown(c.Value)} limit {Shown(c.Limit)} utilisation {Number(c.Utilisation)} margin {Shown(c.Margin)} text {c.Text}");
                    break;
                case CautionStatementResult c:
                    sb.Append($"fired {c.Fired}");
                    break;
            }
            sb.Append('\n');
            foreach (var c in s.Cautions) sb.Append($"  caution {c.Level} {c.Span} {c.Message} accepted {c.AcceptedReason} origin {c.Origin} code {c.Code}\n");
        }
        foreach (var (k, v) in result.Metadata.OrderBy(p => p.Key, StringComparer.Ordinal)) sb.Append($"metadata {k} {v}\n");
        sb.Append($"display {result.Display.Units} {result.Display.Digits.ToString(CultureInfo.InvariantCulture)}\n");
        foreach (var i in result.Imports) sb.Append($"import {i}\n");
        return sb.ToString();
    }

    private static string Shown(DisplayedValue? v) =>
        v is null ? "none" : $"{v.Text} [{Number(v.Number)} {v.Unit}; si {Number(v.Quantity.Si)}]";

    private static string Number(double? x) => x is double d ? d.ToString("R", CultureInfo.InvariantCulture) : "none";
}
