using System.Globalization;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// One line of <c>Cases/oracle.cases</c>: a CutSheet expression ending in <c>as TARGET</c>, then
/// fields separated by <c>⇶</c>, each <c>KEY: VALUE</c>, then an optional <c>// note</c>:
/// <list type="bullet">
/// <item><c>units: HAVE ⇒ WANT</c> — GNU units spelling of the same conversion;</item>
/// <item><c>pint: HAVE ⇒ WANT</c> — pint spelling of the same conversion;</item>
/// <item><c>named: NUMBER</c> — a value from a named source (the note must name it), checked to half a unit of its last digit;</item>
/// <item><c>pending: REASON</c> — CutSheet is known to disagree with the oracles on this line (a table fault
/// reported to the lead); the test asserts that it still disagrees, so the marker must go when the table is fixed.</item>
/// </list>
/// Every expected number comes from an oracle or a named source, never from CutSheet.
/// </summary>
public sealed record OracleCase(string Where, string Expression, OracleQuery? Units, OracleQuery? Pint, string? Named, string? Pending, string Note)
{
    public const string FileName = "oracle.cases";
    public const string Separator = "⇶";
    public const string Into = "⇒";

    public double? NamedValue => Named is null ? null : double.Parse(Named, NumberStyles.Float, CultureInfo.InvariantCulture);

    /// <summary>The unit after the last <c>as</c>: the unit CutSheet shows the value in.</summary>
    public string Target => Expression[(Expression.LastIndexOf(" as ", StringComparison.Ordinal) + 4)..].Trim();

    private static readonly Lazy<IReadOnlyList<OracleCase>> LazyAll = new(() => Load(RepoPaths.TestData("Cases", FileName)).ToList());

    public static IReadOnlyList<OracleCase> All => LazyAll.Value;

    public static OracleCase Find(string where) => All.Single(c => c.Where == where);

    public static IEnumerable<OracleCase> Load(string path)
    {
        int lineNumber = 0;
        foreach (var raw in File.ReadLines(path))
        {
            lineNumber++;
            string line = raw.Trim();
            if (line.Length == 0 || line.StartsWith('#')) continue;
            yield return ParseLine(line, $"{Path.GetFileName(path)}:{lineNumber}");
        }
    }

    public static OracleCase ParseLine(string line, string where)
    {
        string note = "";
        int comment = line.IndexOf("//", StringComparison.Ordinal);
        if (comment >= 0)
        {
            note = line[(comment + 2)..].Trim();
            line = line[..comment];
        }
        var fields = line.Split(Separator).Select(f => f.Trim()).ToArray();
        string expression = fields[0];
        if (!expression.Contains(" as ", StringComparison.Ordinal)) throw new FormatException($"{where}: the expression needs 'as TARGET': '{expression}'");
        OracleQuery? units = null, pint = null;
        string? named = null, pending = null;
        foreach (var field in fields.Skip(1))
        {
            int colon = field.IndexOf(':');
            if (colon < 0) throw new FormatException($"{where}: field without KEY: '{field}'");
            string key = field[..colon].Trim(), value = field[(colon + 1)..].Trim();
            switch (key)
            {
                case "units": units = OracleQuery.Parse(value, where); break;
                case "pint": pint = OracleQuery.Parse(value, where); break;
                case "named": named = value; break;
                case "pending": pending = value; break;
                default: throw new FormatException($"{where}: unknown field '{key}'");
            }
        }
        if (units is null && pint is null && named is null) throw new FormatException($"{where}: no oracle and no named value");
        if (named is not null && note.Length == 0) throw new FormatException($"{where}: a named value needs its source in the // note");
        if (pending is not null && units is null && pint is null) throw new FormatException($"{where}: pending needs an oracle to disagree with");
        var result = new OracleCase(where, expression, units, pint, named, pending, note);
        _ = result.NamedValue; // fail at load time on a malformed number
        return result;
    }
}
