using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// The screw examples in examples/ evaluate cleanly: no errors, every check passed, and every
/// caution either absent or accepted with a reason (what <c>cutsheet check --fail-on caution</c> asks).
/// </summary>
public class ScrewsExamplesTests
{
    public static TheoryData<string> Examples => new() { "lift-table-trapezoidal.cutsheet", "ball-screw-margins.cutsheet" };

    [Theory, MemberData(nameof(Examples))]
    public void Example_passes_strict_checking(string file)
    {
        string path = Path.Combine(RepoPaths.Examples, file);
        var result = SheetRunner.Run(File.ReadAllText(path), path);
        string all = string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}"));
        Assert.False(result.HasErrors, all);
        Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Warning);
        Assert.NotEmpty(result.Checks);
        Assert.All(result.Checks, c => Assert.Equal(CheckStatus.Passed, c.Status));
        Assert.All(result.Cautions, c => Assert.True(c.IsAccepted, $"unaccepted caution: {c.Message}"));
    }

    [Fact]
    public void Lift_table_judges_self_locking_on_the_thread_with_the_collar_shown_apart()
    {
        string path = Path.Combine(RepoPaths.Examples, "lift-table-trapezoidal.cutsheet");
        var r = SheetRunner.Run(File.ReadAllText(path), path);
        double Si(string name) => r.Definitions.Single(d => d.Name == name).Value!.Quantity.Si;
        // [calc] Tr 32×6, F = 2.5 kN, f = 0.13 / 0.10, α = 15°: the raise total is thread + collar, and the
        // thread alone still needs torque to lower at the lowest friction (margin 1.572 > 1.25).
        Assert.Equal(Si("T_thread_up") + Si("T_collar"), Si("T_raise"), 9);
        Assert.True(Si("T_down_low") > 0);
        Assert.True(Si("T_lower") > Si("T_down_nom"), "the collar adds to the lowering torque but is not what holds");
        Assert.Equal(1.5720, Si("margin_low"), 3);
    }
}
