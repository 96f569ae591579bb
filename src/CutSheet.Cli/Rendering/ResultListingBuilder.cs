using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Output;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Rendering;

/// <summary>
/// Turns a sheet's statement results into listing lines: headings as section lines, one row per
/// definition (line, name, value, unit, description), one per check (status, utilisation, margin),
/// and one per caution that fired.
/// </summary>
internal static class ResultListingBuilder
{
    public const string DefinitionGroup = "definition";
    public const string CheckGroup = "check";
    public const string CautionGroup = "caution";

    public static IReadOnlyList<ListingLine> Build(SheetEvaluation evaluation)
    {
        var statements = evaluation.Result.Statements;
        var numbers = DecimalAligner.Align(statements.OfType<DefinitionResult>().Select(NumberText).ToList());
        int nextNumber = 0;
        var lines = new List<ListingLine>();
        foreach (var statement in statements)
        {
            switch (statement)
            {
                case HeadingResult heading:
                    lines.Add(new ListingLine.Heading(heading.Heading.Level, heading.Heading.Text));
                    break;
                case DefinitionResult definition:
                    lines.Add(DefinitionRow(definition, numbers[nextNumber++], evaluation.Overrides));
                    break;
                case CheckResult check:
                    lines.Add(CheckRow(check, CheckExpression.Of(evaluation.Result, check)));
                    break;
                case CautionStatementResult caution:
                    // A quiet caution has nothing to say; one that fired is listed from its caution result below.
                    if (caution.Fired is null) lines.Add(UnknownCautionRow(caution));
                    else if (caution.Fired == true && caution.Cautions.Count == 0) lines.Add(FiredCautionStatementRow(caution));
                    break;
            }
            foreach (var fired in statement.Cautions) lines.Add(CautionRow(statement.Line, fired));
        }
        return lines;
    }

    private static string NumberText(DefinitionResult d) => d.Value?.NumberText ?? "?";

    private static ListingLine.Row DefinitionRow(DefinitionResult d, string alignedNumber, IReadOnlyDictionary<string, string> overrides)
    {
        string unit = d.Value is null ? "" : d.Value.Unit + (d.Value.Alternate is null ? "" : $" ({d.Value.Alternate})");
        var notes = new List<string>();
        if (d.Value is null) notes.Add("value unknown: see the diagnostics");
        if (!string.IsNullOrEmpty(d.Description)) notes.Add(d.Description);
        if (d.IsOverridden) notes.Add(overrides.TryGetValue(d.Name, out var given) ? $"[set to {given}]" : "[set]");
        if (d.IsAssumed) notes.Add("[assumed]");
        return new ListingLine.Row(DefinitionGroup,
        [
            new Cell(Words.Line(d.Line), Tone.Faint, AlignRight: true),
            new Cell(d.Name, d.IsInput ? Tone.Plain : Tone.Strong),
            new Cell(alignedNumber, d.Value is null ? Tone.Bad : Tone.Plain),
            new Cell(unit),
            new Cell(string.Join("  ", notes), Tone.Faint),
        ]);
    }

    private static ListingLine.Row CheckRow(CheckResult c, string expression) => new(CheckGroup,
    [
        new Cell(Words.Line(c.Line), Tone.Faint, AlignRight: true),
        new Cell("check"),
        new Cell(Words.Status(c.Status), Words.StatusTone(c.Status)),
        new Cell(c.Utilisation is { } u ? Words.Percent(u) : "", AlignRight: true),
        new Cell(c.Margin is null ? "" : "margin " + c.Margin.Text),
        new Cell(expression),
        // The values substituted into the comparison, for the reviewer; an unevaluated check has none.
        new Cell(c.Status == CheckStatus.NotEvaluated || c.Text == expression ? "" : $"({c.Text})", Tone.Faint),
        new Cell(c.Description ?? "", Tone.Faint),
    ]);

    private static ListingLine.Row CautionRow(int line, CautionResult caution) => new(CautionGroup,
    [
        new Cell(Words.Line(line), Tone.Faint, AlignRight: true),
        new Cell(Words.Level(caution.Level), caution.IsAccepted ? Tone.Faint : Words.LevelTone(caution.Level)),
        new Cell(caution.Message),
        new Cell(caution.IsAccepted ? $"[accepted: {caution.AcceptedReason}]" : "", Tone.Faint),
        new Cell(caution.Origin is null ? "" : $"(from {caution.Origin})", Tone.Faint),
    ]);

    private static ListingLine.Row FiredCautionStatementRow(CautionStatementResult caution) => new(CautionGroup,
    [
        new Cell(Words.Line(caution.Line), Tone.Faint, AlignRight: true),
        new Cell(Words.Level(caution.Caution.Level), Words.LevelTone(caution.Caution.Level)),
        new Cell(caution.Caution.Message.Value),
    ]);

    private static ListingLine.Row UnknownCautionRow(CautionStatementResult caution) => new(CautionGroup,
    [
        new Cell(Words.Line(caution.Line), Tone.Faint, AlignRight: true),
        new Cell(Words.Level(caution.Caution.Level).ToLowerInvariant() + "?", Tone.Attention),
        new Cell(caution.Caution.Message.Value),
        new Cell("[condition could not be evaluated]", Tone.Faint),
    ]);
}
