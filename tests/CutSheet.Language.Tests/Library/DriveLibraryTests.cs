namespace CutSheet.Language.Tests.Library;

/// <summary>The feed-drive sheet: caution thresholds on both sides and properties.</summary>
public class DriveLibraryTests
{
    private static string[] Cautions(string formula) =>
        LibraryProbe.Eval("drives", formula).Codes.Where(c => c.StartsWith("CUT41", StringComparison.Ordinal)).ToArray();

    [Theory]
    [InlineData(9.99, false)]
    [InlineData(10.0, false)]
    [InlineData(10.01, true)]
    public void InertiaRatioCautionAboveTheStatedLimit(double ratio, bool fires)
    {
        // Load-to-rotor inertia ratio normally 3 to 10 (THK ball-screw selection pages [pub]; 5–10 [cp]).
        Assert.Equal(fires ? new[] { "CUT4102" } : [], Cautions($"inertia_ratio(J_load: {LibraryProbe.N(ratio)} kg·cm², J_motor: 1 kg·cm²)"));
    }

    [Theory]
    [InlineData(0.79, null)]
    [InlineData(0.81, "CUT4102")]
    [InlineData(1.01, "CUT4103")]
    [InlineData(-0.81, "CUT4102")]
    public void MotorTorqueCautionAt80Percent(double share, string? code)
    {
        Assert.Equal(code is null ? [] : new[] { code }, Cautions($"motor_torque_utilisation(T: {LibraryProbe.N(share)} N·m, T_rated: 1 N·m)"));
    }

    [Theory]
    [InlineData(1.99, true)]
    [InlineData(2.01, false)]
    public void StepperSafetyFactorCaution(double available, bool fires)
    {
        Assert.Equal(fires ? new[] { "CUT4102" } : [], Cautions($"stepper_safety_factor(T_required: 1 N·m, T_available: {LibraryProbe.N(available)} N·m)"));
    }

    [Theory]
    [InlineData("m: 30 kg", true)]
    [InlineData("m: 30 kg, brake: true", false)]
    [InlineData("m: 30 kg, m_counter: 30 kg", false)]
    [InlineData("m: 30 kg, m_counter: 29.9 kg", true)]
    [InlineData("m: 30 kg, incline: 0 deg", false)]
    public void VerticalAxisWithoutBrakeOrCounterbalance(string args, bool fires)
    {
        Assert.Equal(fires ? new[] { "CUT4103" } : [], Cautions($"gravity_load({args})"));
    }

    [Theory]
    [InlineData(99.9, false)]
    [InlineData(100.1, true)]
    public void NetAidingAxialLoadCaution(double aiding, bool fires)
    {
        Assert.Equal(fires ? new[] { "CUT4102" } : [], Cautions($"axial_load(F_friction: 100 N, F_cut_aiding: {LibraryProbe.N(aiding)} N)"));
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(0.9)]
    [InlineData(0.99)]
    public void AnEfficiencyBetweenZeroAndOneRaisesTheTorqueAboveTheIdealOne(double eta)
    {
        // 0 < η < 1: the driving torque is F·P_h/(2π·η), above the frictionless F·P_h/(2π).
        var (ideal, _) = LibraryProbe.Eval("drives", "motor_load_torque(F_a: 1 kN, lead: 5 mm/rev, eta_screw: 1)");
        var (real, _) = LibraryProbe.Eval("drives", $"motor_load_torque(F_a: 1 kN, lead: 5 mm/rev, eta_screw: {LibraryProbe.N(eta)})");
        Assert.True(real > ideal);
        Assert.Equal(ideal / eta, real, 12);
    }

    [Theory]
    [InlineData("eta_screw: 0")]
    [InlineData("eta_screw: 1.01")]
    [InlineData("eta_screw: -0.5")]
    public void AnEfficiencyOutsideZeroToOneIsRefused(string eta)
    {
        var (si, codes) = LibraryProbe.Eval("drives", $"motor_load_torque(F_a: 1 kN, lead: 5 mm/rev, {eta})");
        Assert.True(double.IsNaN(si));
        Assert.Contains("CUT5005", codes);
    }

    [Fact]
    public void RmsOfAConstantTorqueIsThatTorqueAndRmsIsAtLeastTheMean()
    {
        var (constant, _) = LibraryProbe.Eval("drives", "rms_torque(T: [2 N·m, 2 N·m, 2 N·m], t: [1 s, 2 s, 3 s])");
        Assert.Equal(2, constant, 12);
        var (rms, _) = LibraryProbe.Eval("drives", "rms_torque(T: [3 N·m, 1 N·m], t: [1 s, 1 s])");
        Assert.True(rms >= 2);
    }

    [Fact]
    public void EveryFunctionOfTheSheetHasADescriptionAndASource() =>
        CuttingLibraryTests.AssertDocumented(CutSheet.Language.Library.LibrarySheets.Read("drives")!);

    [Fact]
    public void TheLibraryExamplesCheckWithoutErrors()
    {
        foreach (var name in new[] { "bench-mill-hold.cutsheet", "bench-mill-hold-raw.cutsheet", "milling-cut-forces.cutsheet", "feed-motor-sizing.cutsheet" })
        {
            string path = Path.Combine(Support.RepoPaths.Examples, name);
            var result = SheetRunner.Run(File.ReadAllText(path), path);
            Assert.False(result.HasErrors, name + ": " + string.Join("; ", result.Diagnostics.Select(d => d.Code + " " + d.Message)));
            Assert.All(result.Checks, c => Assert.Equal(CutSheet.Language.Results.CheckStatus.Passed, c.Status));
        }
    }
}
