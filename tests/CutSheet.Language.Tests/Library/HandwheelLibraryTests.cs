using CutSheet.Language.Diagnostics;

namespace CutSheet.Language.Tests.Library;

/// <summary>The hand-wheel sheet: each caution fires just over its threshold and stays silent just under it.</summary>
public class HandwheelLibraryTests
{
    private static string[] Cautions(string formula) =>
        LibraryProbe.Eval("handwheels", formula).Codes.Where(c => c.StartsWith("CUT41", StringComparison.Ordinal)).ToArray();

    [Theory]
    [InlineData(0.49, new string[0])]
    [InlineData(0.50, new string[0])]
    [InlineData(0.51, new[] { "CUT4102" })]
    [InlineData(0.69, new[] { "CUT4102" })]
    [InlineData(0.70, new[] { "CUT4102" })]
    [InlineData(0.71, new[] { "CUT4103" })]
    public void RiskMultiplierBandsOfEn1005Part3(double m_r, string[] expected)
    {
        // EN 1005-3 risk multiplier m_r = F/F_Br: ≤ 0.5 recommended, 0.5–0.7 not recommended,
        // > 0.7 to be avoided [pub, via a secondary reproduction].
        Assert.Equal(expected, Cautions($"risk_multiplier(F: {LibraryProbe.N(m_r * 100)} N, F_Br: 100 N)"));
    }

    [Theory]
    [InlineData(21.9, 60, false)]
    [InlineData(22.1, 60, true)]
    [InlineData(44.9, 150, false)]
    [InlineData(45.1, 150, true)]
    public void RimForceOverTheCrankGuidance(double force, double radius, bool fires)
    {
        // Crank guidance derived from MIL-STD-1472 [pub, secondary]: small cranks 9–22 N, large (12.5–20 cm) 22–45 N.
        Assert.Equal(fires, Cautions($"rim_force_check(F_rim: {LibraryProbe.N(force)} N, r: {LibraryProbe.N(radius)} mm)").Contains("CUT4102"));
    }

    [Theory]
    [InlineData("1 N", false, "load_aids_backdrivable")]
    [InlineData("-1 N", false, "load_opposes_feed")]
    [InlineData("0 N", false, "load_opposes_feed")]
    [InlineData("1 N", true, "load_aids_self_locking")]
    public void LoadCaseFollowsTheSignOfTheFeedForce(string force, bool selfLocking, string expected)
    {
        var result = SheetRunner.Run($"use handwheels\nx = load_case_of(F_feed: {force}, self_locking: {(selfLocking ? "true" : "false")})\n");
        Assert.Equal(expected, result.Definitions.Single(d => d.Name == "x").Value!.NumberText);
    }

    [Theory]
    [InlineData("load_aids_backdrivable", true)]
    [InlineData("load_aids_self_locking", false)]
    [InlineData("load_opposes_feed", false)]
    public void HoldingABackDrivenScrewIsAWarningNotANotice(string loadCase, bool fires)
    {
        var codes = Cautions($"rim_force_to_hold(case: {loadCase}, T_backdrive: 0.5 N·m, r: 60 mm)");
        Assert.Equal(fires ? new[] { "CUT4103" } : [], codes);
    }

    [Theory]
    [InlineData("backlash: 0.01 mm, F_feed: 0.1 N", true)]
    [InlineData("backlash: 0.01 mm, F_feed: -0.1 N", false)]
    [InlineData("backlash: 0 mm, F_feed: 100 N", false)]
    public void BacklashWithAnAidingLoad(string args, bool fires)
    {
        Assert.Equal(fires ? new[] { "CUT4103" } : [], Cautions($"backlash_jump({args})"));
    }

    [Theory]
    [InlineData("disengages: false", true)]
    [InlineData("disengages: true", false)]
    public void HandWheelCoupledUnderPowerFeed(string args, bool fires)
    {
        // ISO 16090-1 (recalled): hand-wheels not to turn under power feed.
        Assert.Equal(fires ? new[] { "CUT4103" } : [], Cautions($"handwheel_speed_under_power_feed(v_f: 100 mm/min, lead: 5 mm/rev, {args})"));
    }

    [Fact]
    public void EveryFunctionOfTheSheetHasADescriptionAndASource() =>
        CuttingLibraryTests.AssertDocumented(CutSheet.Language.Library.LibrarySheets.Read("handwheels")!);

    [Fact]
    public void TheLibrarySheetsLoadTogetherWithoutNameClashes()
    {
        var result = SheetRunner.Run("use screws\nuse handwheels\nuse cutting\nuse drives\nx = 1 mm\n");
        Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Error);
    }
}
