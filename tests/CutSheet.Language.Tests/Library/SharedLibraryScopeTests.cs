using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// Library sheets are evaluated once per process and display setting and then shared by every
/// run, on any thread. These tests hold the sharing to what it promises: many sheets evaluated at
/// once give what each gives alone, the run's unit system still reaches values computed by library
/// functions, and an import with overrides still gets its own evaluation.
/// </summary>
public sealed class SharedLibraryScopeTests
{
    private const string Sheet = """
        use screws
        use ballscrews as b
        d = 24 mm
        lam = lead_angle(lead: 5 mm/rev, d: d) as deg
        d_m = mean_diameter(d: d, pitch: 5 mm)
        T = b.drive_torque(F: 2 kN, lead: 5 mm/rev, eta: 0.9)
        """;

    private static string Describe(SheetResult r) =>
        string.Join("\n", r.Definitions.Select(d => $"{d.Name} {d.Value?.Text}"))
        + "\n" + string.Join("\n", r.Diagnostics.Select(d => $"{d.Code} {d.Message}"));

    [Fact]
    public void Sheets_evaluated_at_once_give_what_each_gives_alone()
    {
        var options = new[] { RunOptions.Default, new RunOptions { Units = UnitSystem.Inch }, new RunOptions { Digits = 6 } };
        var alone = options.Select(o => Describe(SheetRunner.Run(Sheet, null, o))).ToArray();
        Assert.All(alone, a => Assert.DoesNotContain("CUT", a));
        var together = new string[48];
        Parallel.For(0, together.Length, new ParallelOptions { MaxDegreeOfParallelism = 8 },
            i => together[i] = Describe(SheetRunner.Run(Sheet, null, options[i % options.Length])));
        for (int i = 0; i < together.Length; i++) Assert.Equal(alone[i % options.Length], together[i]);
    }

    [Fact]
    public void Values_from_library_functions_follow_the_runs_unit_system()
    {
        // d_m = 24 mm − 5 mm / 2 = 21.5 mm [calc]; in inches 21.5 / 25.4 = 0.8465 in [calc].
        var metric = SheetRunner.Run(Sheet).Definitions.Single(d => d.Name == "d_m").Value!;
        var inch = SheetRunner.Run(Sheet, null, new RunOptions { Units = UnitSystem.Inch }).Definitions.Single(d => d.Name == "d_m").Value!;
        Assert.Equal("21.50 mm", metric.Text);
        Assert.Equal("0.8465 in", inch.Text);
    }
}
