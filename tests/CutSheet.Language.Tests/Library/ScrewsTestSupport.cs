using System.Globalization;
using CutSheet.Language.Results;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// Runs small sheets against the screw library sheets (<c>use screws</c>, <c>use ballscrews</c>)
/// and reads their results by name, for the screw and ball-screw library tests.
/// </summary>
internal static class ScrewsTestSupport
{
    public const string Preamble = "use screws\nuse ballscrews\n";

    /// <summary>Evaluates <paramref name="body"/> after importing both screw library sheets.</summary>
    public static SheetResult RunLibrary(string body) => SheetRunner.Run(Preamble + body + "\n");

    public static DefinitionResult Def(this SheetResult result, string name) =>
        result.Definitions.Single(d => d.Name == name);

    /// <summary>The SI value of a definition; fails with the sheet's diagnostics when it is unknown.</summary>
    public static double Si(this SheetResult result, string name)
    {
        var value = result.Def(name).Value;
        Assert.True(value is not null, $"{name} is unknown: {Describe(result)}");
        return value!.Quantity.Si;
    }

    /// <summary>The codes of the sheet's own diagnostics on the first line of definition <paramref name="name"/>.</summary>
    public static IReadOnlyList<string> CodesOn(this SheetResult result, string name)
    {
        var source = result.Syntax.Source;
        int line = source.GetPosition(result.Def(name).Span.Start).Line;
        return result.Diagnostics.Where(d => d.Path is null && source.GetPosition(d.Span.Start).Line == line).Select(d => d.Code).ToList();
    }

    /// <summary>
    /// A caution's threshold: <paramref name="code"/> is raised on the hazardous side, not on the safe
    /// side, and the sheet has no errors.
    /// </summary>
    public static void AssertThreshold(string name, string setup, string hazardous, string safe, string code)
    {
        var r = RunLibrary($"{setup}\nhazard = {hazardous}\nsafe = {safe}");
        Assert.True(r.CodesOn("hazard").Contains(code), $"{name}: expected {code} on the hazardous side, got {Describe(r)}");
        Assert.False(r.CodesOn("safe").Contains(code), $"{name}: {code} raised on the safe side: {Describe(r)}");
        Assert.False(r.HasErrors, $"{name}: {Describe(r)}");
    }

    public static string Describe(SheetResult result) =>
        "[" + string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}")) + "]";

    /// <summary>A number as sheet text: invariant culture, plain notation (the lexer reads no 'E').</summary>
    public static string N(double x) => x.ToString("0.###############", CultureInfo.InvariantCulture);

    /// <summary>Relative closeness, with an absolute floor for values near zero.</summary>
    public static bool Close(double a, double b, double relative, double absolute = 0) =>
        Math.Abs(a - b) <= Math.Max(absolute, relative * Math.Max(Math.Abs(a), Math.Abs(b)));
}
