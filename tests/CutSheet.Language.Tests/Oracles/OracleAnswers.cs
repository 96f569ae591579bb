namespace CutSheet.Language.Tests.Oracles;

/// <summary>
/// The oracles' answers for every line of oracle.cases, asked once per test run (one GNU units
/// process and one python process for all lines) and shared by the per-line tests. A missing
/// oracle is remembered as its exception, so every line fails with the install hint.
/// </summary>
public static class OracleAnswers
{
    private static readonly Lazy<IReadOnlyDictionary<string, OracleAnswer>> LazyUnits = new(() =>
    {
        var cases = OracleCase.All.Where(c => c.Units is not null).ToList();
        var answers = GnuUnits.Convert(cases.Select(c => c.Units!).ToList());
        return cases.Zip(answers).ToDictionary(p => p.First.Where, p => p.Second);
    });

    private static readonly Lazy<IReadOnlyDictionary<string, OracleAnswer>> LazyPint = new(() =>
    {
        var cases = OracleCase.All.Where(c => c.Pint is not null).ToList();
        var (_, answers) = Pint.Convert(cases.Select(c => c.Pint!).ToList());
        return cases.Zip(answers).ToDictionary(p => p.First.Where, p => p.Second);
    });

    public static OracleAnswer FromGnuUnits(OracleCase c) => LazyUnits.Value[c.Where];

    public static OracleAnswer FromPint(OracleCase c) => LazyPint.Value[c.Where];
}
