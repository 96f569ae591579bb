using CsCheck;
using static CutSheet.Language.Tests.Library.ScrewsTestSupport;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// The screws library sheet (sliding power screws, Shigley §8-2): cross-checks between its
/// forms over random inputs, and each caution at its threshold. The sourced check values are
/// in <c>Cases/sheets/library-screws.cutsheet</c>.
/// </summary>
public class ScrewsLibraryTests
{
    private const int Iterations = 60;

    /// <summary>Random power-screw geometry: load, mean diameter, lead, friction and half-angle.</summary>
    private static readonly Gen<(double F, double Dm, double L, double F_, double Alpha)> Screw =
        Gen.Select(Gen.Double[0.1, 100], Gen.Double[5, 100], Gen.Double[0.5, 40], Gen.Double[0.001, 0.3], Gen.Double[0, 30],
            (f, dm, l, mu, a) => (f, dm, l, mu, a));

    private static string Args((double F, double Dm, double L, double F_, double Alpha) s) =>
        $"F: {N(s.F)} kN, d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: {N(s.F_)}, alpha: {N(s.Alpha)} deg";

    private static bool Raisable((double F, double Dm, double L, double F_, double Alpha) s) =>
        Math.PI * s.Dm > s.F_ / Math.Cos(s.Alpha * Math.PI / 180) * s.L * 1.001;

    [Fact]
    public void Shigley_torque_form_and_friction_angle_efficiency_form_agree()
    {
        // [calc] e = F l / (2π T_R) with T_R from Eq. 8-1/8-5 equals tan λ / tan(λ + ρ′), tan ρ′ = f sec α.
        Screw.Where(Raisable).Sample(s =>
        {
            var r = RunLibrary($"""
                T = raise_thread_torque({Args(s)})
                e_torque = screw_efficiency(F: {N(s.F)} kN, lead: {N(s.L)} mm/rev, T_R: T)
                e_angle = thread_efficiency(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: {N(s.F_)}, alpha: {N(s.Alpha)} deg)
                """);
            Assert.True(Close(r.Si("e_torque"), r.Si("e_angle"), 1e-9), $"{r.Si("e_torque")} vs {r.Si("e_angle")} for {Args(s)}");
        }, iter: Iterations);
    }

    [Fact]
    public void Thread_efficiency_lies_between_zero_and_one_for_valid_inputs()
    {
        Screw.Where(Raisable).Sample(s =>
        {
            var r = RunLibrary($"e = thread_efficiency(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: {N(s.F_)}, alpha: {N(s.Alpha)} deg)");
            double e = r.Si("e");
            Assert.True(e > 0 && e < 1, $"e = {e} for {Args(s)}");
        }, iter: Iterations);
        Assert.Equal(1.0, RunLibrary("e = thread_efficiency(d_m: 30 mm, lead: 8 mm/rev, f: 0)").Si("e"), 12);   // [calc] no friction, no loss
    }

    [Fact]
    public void Self_locking_holds_exactly_when_the_thread_lowering_torque_is_positive()
    {
        // [mem] Shigley Eq. 8-3 with f sec α: self-locking ⇔ π f d_m > l cos α ⇔ T_L(thread) > 0 ⇔ the hold torque ≤ 0.
        Screw.Sample(s =>
        {
            var r = RunLibrary($"""
                T_L = lower_thread_torque({Args(s)})
                T_hold = holding_torque({Args(s)})
                m = self_locking_margin(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: {N(s.F_)}, alpha: {N(s.Alpha)} deg)
                """);
            double m = r.Si("m");
            if (Math.Abs(m - 1) < 1e-9) return;
            bool locking = m > 1;
            Assert.Equal(locking, r.Si("T_L") > 0);
            Assert.Equal(locking, r.Si("T_hold") < 0);
            Assert.Equal(!locking, r.CodesOn("T_hold").Contains("CUT4103"));
            Assert.Equal(!locking, r.CodesOn("T_L").Contains("CUT4102"));
        }, iter: Iterations);
    }

    [Fact]
    public void Collar_friction_never_makes_an_overhauling_thread_look_self_locking()
    {
        // CHECK-VALUES: with collar friction the total lowering torque can be positive while the thread overhauls.
        Gen.Select(Screw, Gen.Double[0.01, 0.3], Gen.Double[10, 200], (s, fc, dc) => (s, fc, dc)).Sample(t =>
        {
            var (s, fc, dc) = t;
            var r = RunLibrary($"""
                T_L = lower_torque({Args(s)}, f_c: {N(fc)}, d_c: {N(dc)} mm)
                m = self_locking_margin(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: {N(s.F_)}, alpha: {N(s.Alpha)} deg)
                """);
            double m = r.Si("m");
            if (Math.Abs(m - 1) < 1e-9) return;
            var codes = r.CodesOn("T_L");
            if (m < 1) Assert.True(codes.Contains("CUT4103") || codes.Contains("CUT4102"), $"overhauling thread without a caution: {Describe(r)}");
            else Assert.DoesNotContain(codes, c => c.StartsWith("CUT410", StringComparison.Ordinal));
        }, iter: Iterations);
    }

    [Fact]
    public void A_thread_that_just_holds_is_at_most_fifty_percent_efficient()
    {
        // [pub] Adaptive Books "Statics" §5.6, Problem 3: the maximum efficiency of a self-locking screw is 50 %
        // (at λ = ρ′ the efficiency is tan λ / tan 2λ = (1 − tan² λ)/2). Leads steep enough to need f ≥ 1 are left out.
        Screw.Where(s => s.L / (Math.PI * s.Dm) < 0.9).Sample(s =>
        {
            var r = RunLibrary($"""
                f_0 = locking_friction(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, alpha: {N(s.Alpha)} deg)
                e = thread_efficiency(d_m: {N(s.Dm)} mm, lead: {N(s.L)} mm/rev, f: f_0, alpha: {N(s.Alpha)} deg)
                """);
            Assert.True(r.Si("e") <= 0.5 + 1e-12, $"e = {r.Si("e")} at the locking friction for {Args(s)}");
        }, iter: Iterations);
    }

    [Fact]
    public void Lead_angle_of_the_geometry_sheet_and_of_the_thread_agree()
    {
        // [calc] thread_lead_angle(d, P, P_h) = lead_angle(P_h, d − P/2).
        Gen.Select(Gen.Double[10, 120], Gen.Double[1, 8], Gen.Int[1, 4], (d, p, n) => (d, p, n)).Sample(t =>
        {
            var (d, p, n) = t;
            var r = RunLibrary($"""
                a = thread_lead_angle(d: {N(d)} mm, pitch: {N(p)} mm, lead: lead(pitch: {N(p)} mm, starts: {n}))
                b = lead_angle(lead: lead(pitch: {N(p)} mm, starts: {n}), d: mean_diameter(d: {N(d)} mm, pitch: {N(p)} mm))
                """);
            Assert.True(Close(r.Si("a"), r.Si("b"), 1e-12));
            Assert.Empty(r.CodesOn("a"));
        }, iter: Iterations);
    }

    public static TheoryData<string, string, string, string, string> Thresholds => new()
    {
        // name, setup, expression on the hazardous side (by 1 ppm), expression on the safe side, code
        {
            "not self-locking (thread lowering torque)",
            "f_lock = locking_friction(d_m: 29 mm, lead: 6 mm/rev, alpha: 15 deg)",
            "lower_thread_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 - 1e-6), alpha: 15 deg)",
            "lower_thread_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 + 1e-6), alpha: 15 deg)",
            "CUT4102"
        },
        {
            "not self-locking, used to hold a load (warning)",
            "f_lock = locking_friction(d_m: 29 mm, lead: 6 mm/rev, alpha: 15 deg)",
            "holding_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 - 1e-6), alpha: 15 deg)",
            "holding_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 + 1e-6), alpha: 15 deg)",
            "CUT4103"
        },
        {
            "self-locking margin at or below 1",
            "f_lock = locking_friction(d_m: 29 mm, lead: 6 mm/rev, alpha: 15 deg)",
            "self_locking_margin(d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 - 1e-6), alpha: 15 deg)",
            "self_locking_margin(d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 + 1e-6), alpha: 15 deg)",
            "CUT4102"
        },
        {
            "self-locking margin below the required vibration margin",
            "f_lock = locking_friction(d_m: 29 mm, lead: 6 mm/rev, alpha: 15 deg)",
            "self_locking_margin(d_m: 29 mm, lead: 6 mm/rev, f: 1.25 * f_lock * (1 - 1e-6), alpha: 15 deg, required: 1.25)",
            "self_locking_margin(d_m: 29 mm, lead: 6 mm/rev, f: 1.25 * f_lock * (1 + 1e-6), alpha: 15 deg, required: 1.25)",
            "CUT4102"
        },
        {
            "only the collar holds an overhauling thread (warning)",
            "f_lock = locking_friction(d_m: 29 mm, lead: 6 mm/rev, alpha: 15 deg)",
            "lower_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 - 1e-6), alpha: 15 deg, f_c: 0.1, d_c: 40 mm)",
            "lower_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: f_lock * (1 + 1e-6), alpha: 15 deg, f_c: 0.1, d_c: 40 mm)",
            "CUT4103"
        },
        {
            "the load lowers itself even against the collar",
            "T_t = lower_thread_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: 0.02, alpha: 15 deg)\nfc_star = -2 * T_t / (10 kN * 40 mm)",
            "lower_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: 0.02, alpha: 15 deg, f_c: fc_star * (1 - 1e-6), d_c: 40 mm)",
            "lower_torque(F: 10 kN, d_m: 29 mm, lead: 6 mm/rev, f: 0.02, alpha: 15 deg, f_c: fc_star * (1 + 1e-6), d_c: 40 mm)",
            "CUT4102"
        },
        {
            "lead not a whole multiple of the pitch",
            "",
            "thread_lead_angle(d: 32 mm, pitch: 4 mm, lead: 8 mm/rev * (1 + 0.0005001))",
            "thread_lead_angle(d: 32 mm, pitch: 4 mm, lead: 8 mm/rev * (1 + 0.0004999))",
            "CUT4102"
        },
        {
            "lead shorter than the pitch",
            "",
            "thread_lead_angle(d: 32 mm, pitch: 4 mm, lead: 4 mm/rev * (1 - 0.0010001))",
            "thread_lead_angle(d: 32 mm, pitch: 4 mm, lead: 4 mm/rev * (1 - 0.0009999))",
            "CUT4102"
        },
        {
            "trapezoidal pitch above the ISO 2901 range",
            "",
            "trapezoidal_clearance(44 mm * (1 + 1e-6))",
            "trapezoidal_clearance(44 mm)",
            "CUT4104"
        },
    };

    [Theory, MemberData(nameof(Thresholds))]
    public void Each_caution_fires_just_past_its_threshold_and_not_before(string name, string setup, string hazardous, string safe, string code) =>
        AssertThreshold(name, setup, hazardous, safe, code);

    [Fact]
    public void Bad_input_gives_a_diagnostic_never_a_silent_non_finite_value()
    {
        // Inputs of any sign and size: each result is a finite number or unknown with an error.
        Gen.Select(Gen.Double[-50, 50], Gen.Double[-50, 50], Gen.Double[-5, 5], Gen.Double[-100, 100], (a, b, c, d) => (a, b, c, d)).Sample(t =>
        {
            var (a, b, c, d) = t;
            string args = $"F: {N(a)} kN, d_m: {N(b)} mm, lead: {N(c)} mm/rev, f: {N(c / 10)}, alpha: {N(d)} deg";
            var r = RunLibrary($"""
                x1 = raise_thread_torque({args})
                x2 = lower_torque({args}, f_c: {N(c / 20)}, d_c: {N(b)} mm)
                x3 = thread_efficiency(d_m: {N(b)} mm, lead: {N(c)} mm/rev, f: {N(c / 10)}, alpha: {N(d)} deg)
                x4 = root_diameter(d: {N(b)} mm, pitch: {N(c)} mm, form: trapezoidal)
                """);
            foreach (var name in new[] { "x1", "x2", "x3", "x4" })
            {
                var value = r.Def(name).Value;
                if (value is null) Assert.True(r.HasErrors, $"{name} unknown without an error");
                else Assert.True(double.IsFinite(value.Quantity.Si), $"{name} = {value.Quantity.Si} for {args}");
            }
        }, iter: Iterations);
    }
}
