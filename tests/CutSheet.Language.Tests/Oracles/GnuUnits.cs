using System.Globalization;

namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// GNU units (Debian package <c>units</c>, 2.22 measured) as an oracle. Spelling traps (STACK-NOTES):
/// <c>rad</c> is a dose there (write <c>radian</c>), <c>ton</c> is a mass, <c>ozf</c> is unknown
/// (write <c>ounce*force</c>), <c>g_n</c> is not gravity (write <c>gravity</c>).
/// </summary>
public static class GnuUnits
{
    public const string Program = "units";
    public const string Package = "units";

    /// <summary>Terse output (the number only), 15 significant digits, no reciprocal line.</summary>
    private static readonly string[] Options = ["-t", "-d", "15", "-1"];

    /// <summary>
    /// All queries through one process (about 20 ms per process start, so one batch instead of
    /// ~200 starts). GNU units reads "You have"/"You want" pairs from stdin; an unknown unit makes
    /// it ask again and shifts every later answer, so a batch that does not give exactly one number
    /// per query is redone one process per query, which names the line at fault.
    /// </summary>
    public static IReadOnlyList<OracleAnswer> Convert(IReadOnlyList<OracleQuery> queries, string program = Program)
    {
        if (queries.Count == 0) return [];
        string stdin = string.Concat(queries.Select(q => Flat(q.Have) + "\n" + Flat(q.Want) + "\n"));
        var output = OracleProcess.Run(program, Options, stdin, Package);
        var lines = output.StdOut.Split('\n', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
        var numbers = lines.Select(TryNumber).ToList();
        if (output.ExitCode == 0 && lines.Length == queries.Count && numbers.All(n => n is not null))
        {
            return numbers.Select((n, i) => new OracleAnswer(n, lines[i])).ToList();
        }
        return queries.Select(q => ConvertOne(q, program)).ToList();
    }

    public static OracleAnswer ConvertOne(OracleQuery query, string program = Program)
    {
        var output = OracleProcess.Run(program, [.. Options, query.Have, query.Want], "", Package);
        string text = (output.StdOut + output.StdErr).Trim();
        double? value = output.ExitCode == 0 ? TryNumber(text) : null;
        return new OracleAnswer(value, text.Replace('\n', ' '));
    }

    /// <summary>The version line, e.g. "GNU Units version 2.22".</summary>
    public static string Version() =>
        OracleProcess.Run(Program, ["--version"], "", Package).StdOut.Split('\n')[0].Trim();

    private static string Flat(string s) => s.Replace('\n', ' ');

    private static double? TryNumber(string s) =>
        double.TryParse(s, NumberStyles.Float, CultureInfo.InvariantCulture, out double v) ? v : null;
}
