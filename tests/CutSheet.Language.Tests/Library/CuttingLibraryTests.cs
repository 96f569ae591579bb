using System.Globalization;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// Runs library calls and reads their values and diagnostics, for the threshold and property
/// tests of the library sheets (the check values themselves live in Cases/sheets/library-*.cutsheet).
/// </summary>
internal static class LibraryProbe
{
    /// <summary>Evaluates <c>use LIBRARY</c> followed by <c>x = FORMULA</c>; returns x in SI units (NaN when unknown) and the codes raised on that line.</summary>
    public static (double Si, string[] Codes) Eval(string library, string formula, string? preamble = null)
    {
        string text = $"use {library}\n{preamble}{(preamble is null ? "" : "\n")}x = {formula}\n";
        var result = SheetRunner.Run(text);
        int line = text.Split('\n').Length - 2;
        var x = result.Definitions.Single(d => d.Name == "x");
        var codes = result.Diagnostics
            .Where(d => d.Path is null && result.Syntax.Source.GetPosition(d.Span.Start).Line == line)
            .Select(d => d.Code).ToArray();
        return (x.Value?.Quantity.Si ?? double.NaN, codes);
    }

    public static string N(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}

/// <summary>The cutting sheet: caution thresholds on both sides, and properties of the milling-force model.</summary>
public class CuttingLibraryTests
{
    private const string Cut = "k_c: 2000 N/mm², a_p: 5 mm, f_z: 0.1 mm/tooth, D: 20 mm, z: 4, K_r: 0.4";

    [Theory]
    [InlineData(0.049, true)]
    [InlineData(0.051, false)]
    [InlineData(1.59, false)]
    [InlineData(1.61, true)]
    public void KienzleFittedRangeCautionFiresJustOutsideOnly(double h, bool fires)
    {
        // Kienzle constants fitted to h ≈ 0.05–1.6 mm (CHECK-VALUES, cautions [cp]).
        var (si, codes) = LibraryProbe.Eval("cutting", $"kienzle_kc(k_c11: 2220 N/mm², m_c: 0.14, h: {LibraryProbe.N(h)} mm)");
        Assert.False(double.IsNaN(si));
        Assert.Equal(fires, codes.Contains(DiagnosticCodes.OutsideValidity));
    }

    [Theory]
    [InlineData(0.79, null)]
    [InlineData(0.81, "CUT4102")]
    [InlineData(0.99, "CUT4102")]
    [InlineData(1.01, "CUT4103")]
    public void SpindlePowerCautionAt80PercentAndWarningOverTheRating(double share, string? code)
    {
        // Spindle power or torque over the machine rating: warn at 80 % (CHECK-VALUES cautions [cp]).
        var (_, codes) = LibraryProbe.Eval("cutting", $"spindle_power_utilisation(P: {LibraryProbe.N(share)} kW, P_available: 1 kW)");
        Assert.Equal(code is null ? [] : new[] { code }, codes.Where(c => c.StartsWith("CUT41", StringComparison.Ordinal)).ToArray());
        var (_, torque) = LibraryProbe.Eval("cutting", $"spindle_torque_utilisation(T: {LibraryProbe.N(share * 10)} N·m, T_rated: 10 N·m)");
        Assert.Equal(code is null ? [] : new[] { code }, torque.Where(c => c.StartsWith("CUT41", StringComparison.Ordinal)).ToArray());
    }

    [Theory]
    [InlineData(0.5)]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(4)]
    [InlineData(6)]
    [InlineData(8)]
    [InlineData(10)]
    public void ClimbAndConventionalFeedForcesHaveOppositeSignsForLightRadialEngagement(double a_e)
    {
        // Up to half the diameter with K_r = 0.4 the climb cut pulls the table and the
        // conventional cut pushes it back (machining texts [cp]; model in cutting.cutsheet).
        var (climb, c1) = LibraryProbe.Eval("cutting", $"feed_force_mean({Cut}, a_e: {LibraryProbe.N(a_e)} mm, mode: climb)");
        var (conv, c2) = LibraryProbe.Eval("cutting", $"feed_force_mean({Cut}, a_e: {LibraryProbe.N(a_e)} mm, mode: conventional)");
        Assert.Empty(c1);
        Assert.Empty(c2);
        Assert.True(climb > 0, $"climb mean {climb}");
        Assert.True(conv < 0, $"conventional mean {conv}");
        var (pull, _) = LibraryProbe.Eval("cutting", $"feed_force_peak_aiding({Cut}, a_e: {LibraryProbe.N(a_e)} mm, mode: climb)");
        var (push, _) = LibraryProbe.Eval("cutting", $"feed_force_peak_opposing({Cut}, a_e: {LibraryProbe.N(a_e)} mm, mode: conventional)");
        Assert.True(pull >= climb, "the peak pull is at least the mean pull");
        Assert.True(push <= conv, "the peak push is at least the mean push");
    }

    [Theory]
    [InlineData(1, 0.0)]
    [InlineData(3, 0.2)]
    [InlineData(5, 0.4)]
    [InlineData(7, 0.6)]
    [InlineData(12, 0.4)]
    [InlineData(20, 0.4)]
    public void MeanFeedForceMatchesANumericalAverageOverToothPositions(double a_e, double kr)
    {
        // [calc] the closed form against a direct sum of the per-tooth forces of z teeth over one tooth pitch.
        const double kc = 2000e6, ap = 0.005, fz = 0.0001, D = 0.02; const int z = 4;
        double phis = Math.Acos(1 - 2 * a_e / 1000 / D);
        foreach (var (mode, s) in new[] { ("climb", 1.0), ("conventional", -1.0) })
        {
            const int steps = 200_000;
            double sum = 0;
            for (int k = 0; k < steps; k++)
            {
                double a = 2 * Math.PI * (k + 0.5) / steps;
                for (int j = 0; j < z; j++)
                {
                    double p = (a + 2 * Math.PI * j / z) % (2 * Math.PI);
                    if (p <= phis) sum += kc * ap * fz * Math.Sin(p) * (s * Math.Cos(p) - kr * Math.Sin(p));
                }
            }
            double numeric = sum / steps;
            var (si, _) = LibraryProbe.Eval("cutting", $"feed_force_mean(k_c: 2000 N/mm², a_p: 5 mm, f_z: 0.1 mm/tooth, D: 20 mm, z: 4, K_r: {LibraryProbe.N(kr)}, a_e: {LibraryProbe.N(a_e)} mm, mode: {mode})");
            Assert.True(Math.Abs(si - numeric) <= 0.1 + 1e-4 * Math.Abs(numeric), $"{mode} a_e {a_e}: {si} against {numeric}");
        }
    }

    [Theory]
    [InlineData("engagement_angle(a_e: 21 mm, D: 20 mm)", "CUT5005")]
    [InlineData("engagement_angle(a_e: 0 mm, D: 20 mm)", "CUT5005")]
    [InlineData("mean_chip_thickness(f_z: 0.1 mm/tooth, a_e: 20 mm, D: 5 mm)", "CUT5005")]
    [InlineData("teeth_in_cut(z: 4, a_e: 30 mm, D: 20 mm)", "CUT5005")]
    [InlineData("kienzle_kc(k_c11: 2220 N/mm², m_c: 0.14, h: -0.1 mm)", "CUT5005")]
    [InlineData("kienzle_kc(k_c11: 2220 N/mm², m_c: 0.14, h: 0.1 mm/rev * 3 rev)", null)]
    [InlineData("chip_width_turning(a_p: 3 mm, kappa_r: 0 deg)", "CUT5005")]
    [InlineData("spindle_torque(P: 1 kW, n: 0 rpm)", "CUT5005")]
    [InlineData("spindle_speed(v_c: 200 m/min, D: 0 mm)", "CUT5005")]
    [InlineData("cutting_speed(D: 20 mm, n: 100 rad/s)", "CUT2202")]
    public void BadInputGivesADiagnosticNeverNaN(string formula, string? code)
    {
        var (si, codes) = LibraryProbe.Eval("cutting", formula);
        if (code is null)
        {
            Assert.False(double.IsNaN(si));
            return;
        }
        Assert.Contains(code, codes);
        Assert.True(double.IsNaN(si), "the value is unknown, never a number computed from bad input");
    }

    [Fact]
    public void EveryFunctionOfTheSheetHasADescriptionAndASource()
    {
        var text = CutSheet.Language.Library.LibrarySheets.Read("cutting")!;
        AssertDocumented(text);
    }

    internal static void AssertDocumented(string text)
    {
        var result = SheetRunner.Run(text);
        Assert.DoesNotContain(result.Diagnostics, d => d.Severity == Severity.Error);
        Assert.NotEmpty(result.Scope.Functions);
        foreach (var fn in result.Scope.Functions.Values)
        {
            Assert.False(string.IsNullOrWhiteSpace(fn.Syntax.Clauses.Description?.Value), $"{fn.Name} has no description");
            Assert.True(fn.Syntax.Clauses.Source is not null, $"{fn.Name} has no source");
        }
    }
}
