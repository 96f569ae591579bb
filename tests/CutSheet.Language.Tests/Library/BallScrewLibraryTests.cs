using CsCheck;
using static CutSheet.Language.Tests.Library.ScrewsTestSupport;

namespace CutSheet.Language.Tests.Library;

/// <summary>
/// The ballscrews library sheet: cross-checks over random inputs (with the sliding-screw forms of
/// the screws sheet among them) and each caution at its threshold. The sourced check values are in
/// <c>Cases/sheets/library-screws-ballscrews.cutsheet</c>.
/// </summary>
public class BallScrewLibraryTests
{
    private const int Iterations = 60;

    /// <summary>Random ball screws: load (kN), nominal diameter (mm), lead (mm/rev), rolling friction.</summary>
    private static readonly Gen<(double F, double D, double L, double Mu)> BallScrew =
        Gen.Select(Gen.Double[0.1, 50], Gen.Double[6, 100], Gen.Double[1, 50], Gen.Double[0.001, 0.02], (f, d, l, mu) => (f, d, l, mu));

    private static double TanLambda((double F, double D, double L, double Mu) s) => s.L / (Math.PI * s.D);

    [Fact]
    public void Efficiencies_lie_between_zero_and_one_for_valid_inputs()
    {
        BallScrew.Where(s => TanLambda(s) > s.Mu * 1.001).Sample(s =>
        {
            var r = RunLibrary($"""
                eta = eta_drive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                eta_b = eta_backdrive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                """);
            Assert.InRange(r.Si("eta"), double.Epsilon, 1 - 1e-15);
            Assert.InRange(r.Si("eta_b"), double.Epsilon, 1 - 1e-15);
            // [calc] below λ ≈ 45° the back-drive efficiency is the lower one (drive efficiency peaks at λ = 45° − ρ/2)
            if (TanLambda(s) < 0.8) Assert.True(r.Si("eta_b") < r.Si("eta"), "the back-drive efficiency is below the drive efficiency");
        }, iter: Iterations);
    }

    [Fact]
    public void Back_drive_efficiency_is_about_two_minus_the_inverse_drive_efficiency()
    {
        // [calc] η′ + 1/η − 2 = 2 ρ² sec² λ + O(ρ³): so η′ ≈ 2 − 1/η for small friction.
        BallScrew.Where(s => TanLambda(s) > s.Mu * 2).Sample(s =>
        {
            var r = RunLibrary($"""
                eta = eta_drive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                eta_b = eta_backdrive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                """);
            double rho = Math.Atan(s.Mu), sec2 = 1 + TanLambda(s) * TanLambda(s);
            double gap = r.Si("eta_b") - (2 - 1 / r.Si("eta"));
            Assert.True(Math.Abs(gap) <= 4 * rho * rho * sec2 + 1e-12, $"gap {gap} for {s}");
        }, iter: Iterations);
    }

    [Fact]
    public void Ball_screw_torques_equal_the_square_thread_forms_with_the_rolling_friction()
    {
        // [calc] With f = μ, α = 0 and d_m = d_0, Shigley's raise torque is F P_h/(2π η) and the
        // hold torque is F P_h η′/(2π): the two library sheets agree.
        BallScrew.Where(s => TanLambda(s) > s.Mu * 1.001).Sample(s =>
        {
            var r = RunLibrary($"""
                eta = eta_drive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                eta_b = eta_backdrive(d_0: {N(s.D)} mm, lead: {N(s.L)} mm/rev, mu: {N(s.Mu)})
                T_ball = drive_torque(F: {N(s.F)} kN, lead: {N(s.L)} mm/rev, eta: eta)
                T_thread = raise_thread_torque(F: {N(s.F)} kN, d_m: {N(s.D)} mm, lead: {N(s.L)} mm/rev, f: {N(s.Mu)})
                T_back = backdrive_torque(F: {N(s.F)} kN, lead: {N(s.L)} mm/rev, eta: eta_b)
                T_hold = holding_torque(F: {N(s.F)} kN, d_m: {N(s.D)} mm, lead: {N(s.L)} mm/rev, f: {N(s.Mu)})
                """);
            Assert.True(Close(r.Si("T_ball"), r.Si("T_thread"), 1e-9), $"{r.Si("T_ball")} vs {r.Si("T_thread")}");
            Assert.True(Close(r.Si("T_back"), r.Si("T_hold"), 1e-9), $"{r.Si("T_back")} vs {r.Si("T_hold")}");
            Assert.True(r.Si("T_ball") > r.Si("T_back"), "driving takes more torque than holding");
        }, iter: Iterations);
    }

    [Fact]
    public void Euler_and_Johnson_meet_at_the_critical_slenderness()
    {
        // [calc] Shigley §4-13: the Johnson parabola is tangent to the Euler curve at P/A = S_y/2.
        var mountings = new[] { "fixed_fixed", "fixed_supported", "supported_supported", "fixed_free" };
        Gen.Select(Gen.Double[5, 80], Gen.Double[250, 1200], Gen.Int[0, 3], (d, sy, m) => (d, sy, m)).Sample(t =>
        {
            var (d, sy, m) = t;
            string common = $"d_r: {N(d)} mm, mounting: {mountings[m]}, S_y: {N(sy)} MPa";
            var r = RunLibrary($"""
                L_1 = critical_slenderness(mounting: {mountings[m]}, S_y: {N(sy)} MPa) * {N(d)} mm / 4
                P_below = buckling_load({common}, L: L_1 * (1 - 1e-9))
                P_above = buckling_load({common}, L: L_1 * (1 + 1e-9))
                P_half_yield = pi * ({N(d)} mm)^2 / 4 * {N(sy)} MPa / 2
                """);
            Assert.True(Close(r.Si("P_below"), r.Si("P_half_yield"), 1e-6));
            Assert.True(Close(r.Si("P_above"), r.Si("P_half_yield"), 1e-6));
        }, iter: Iterations);
    }

    [Fact]
    public void Unsupported_length_and_buckling_safety_factor_are_inverse()
    {
        // [calc] max_unsupported_length(F, n_s) gives the length at which buckling_safety_factor(F) = n_s (Euler range).
        Gen.Select(Gen.Double[0.5, 20], Gen.Double[10, 50], Gen.Double[1.5, 4], (f, d, ns) => (f, d, ns)).Sample(t =>
        {
            var (f, d, ns) = t;
            var r = RunLibrary($"""
                L = max_unsupported_length(F_max: {N(f)} kN, d_r: {N(d)} mm, mounting: fixed_supported, n_s: {N(ns)}, S_y: 600 MPa)
                n = buckling_safety_factor(F_max: {N(f)} kN, d_r: {N(d)} mm, L: L, mounting: fixed_supported, S_y: 600 MPa)
                """);
            if (r.CodesOn("L").Contains("CUT4104")) return;   // not a slender column: Johnson governs, no inverse
            Assert.True(Close(r.Si("n"), ns, 1e-9), $"n = {r.Si("n")} for n_s = {ns}");
        }, iter: Iterations);
    }

    [Fact]
    public void Life_scales_with_the_cube_of_the_load_ratio_and_converts_to_hours_and_travel()
    {
        // [mem] ISO 3408-5: L = (C_a/F_m)³·10⁶ rev; hours = L/n_m; travel = L·P_h.
        Gen.Select(Gen.Double[1, 100], Gen.Double[0.1, 1], Gen.Double[10, 3000], Gen.Double[1, 40], (c, k, n, l) => (c, k, n, l)).Sample(t =>
        {
            var (c, k, n, l) = t;
            double fm = c * k;
            var r = RunLibrary($"""
                L = basic_rating_life(C_a: {N(c)} kN, F_m: {N(fm)} kN)
                L_h = rating_life_hours(C_a: {N(c)} kN, F_m: {N(fm)} kN, n_m: {N(n)} rpm)
                L_s = rating_life_travel(C_a: {N(c)} kN, F_m: {N(fm)} kN, lead: {N(l)} mm/rev)
                """);
            double revs = Math.Pow(c / fm, 3) * 1e6;
            Assert.True(Close(r.Si("L"), revs, 1e-9));
            Assert.True(Close(r.Si("L_h"), revs / (n / 60), 1e-9));
            Assert.True(Close(r.Si("L_s"), revs * l / 1000, 1e-9));
        }, iter: Iterations);
    }

    [Fact]
    public void Mean_load_of_a_spectrum_lies_between_its_smallest_and_largest_load()
    {
        Gen.Select(Gen.Double[0.1, 10].Array[3], Gen.Double[10, 3000].Array[3], Gen.Double[0.01, 1].Array[3], (f, n, q) => (f, n, q)).Sample(t =>
        {
            var (f, n, q) = t;
            string List(double[] xs, string unit) => "[" + string.Join(", ", xs.Select(x => $"{N(x)} {unit}".TrimEnd())) + "]";
            var r = RunLibrary($"F_m = mean_load(F: {List(f, "kN")}, n: {List(n, "rpm")}, q: {List(q, "")})");
            double fm = r.Si("F_m") / 1000;
            Assert.InRange(fm, f.Min() * (1 - 1e-12), f.Max() * (1 + 1e-12));
        }, iter: Iterations);
    }

    public static TheoryData<string, string, string, string, string> Thresholds => new()
    {
        // name, setup, expression on the hazardous side (by 1 ppm), expression on the safe side, code
        {
            "back-drivable axis with an aiding load (warning)",
            "",
            "backdrive_torque(F: 5 kN, lead: 10 mm/rev, eta: 0.000001)",
            "backdrive_torque(F: 5 kN, lead: 10 mm/rev, eta: 0)",
            "CUT4103"
        },
        {
            "friction angle reaches the lead angle (would not back-drive)",
            "t = (10 mm/rev as mm) / (pi * 32 mm)",
            "eta_backdrive(d_0: 32 mm, lead: 10 mm/rev, mu: t * (1 + 1e-6))",
            "eta_backdrive(d_0: 32 mm, lead: 10 mm/rev, mu: t * (1 - 1e-6))",
            "CUT4101"
        },
        {
            "rolling friction outside the rolling model",
            "",
            "eta_drive(d_0: 32 mm, lead: 10 mm/rev, mu: 0.02 * (1 + 1e-6))",
            "eta_drive(d_0: 32 mm, lead: 10 mm/rev, mu: 0.02)",
            "CUT4104"
        },
        {
            "preload lift-off",
            "",
            "preloaded_nut_load(F: 2^(3/2) * 1 kN * (1 + 1e-6), F_pr: 1 kN)",
            "preloaded_nut_load(F: 2^(3/2) * 1 kN * (1 - 1e-6), F_pr: 1 kN)",
            "CUT4102"
        },
        {
            "life in hours below the target",
            "L_h = rating_life_hours(C_a: 4400 N, F_m: 250 N, n_m: 2118 rpm, f_w: 1.2)",
            "rating_life_hours(C_a: 4400 N, F_m: 250 N, n_m: 2118 rpm, f_w: 1.2, target: L_h * (1 + 1e-6))",
            "rating_life_hours(C_a: 4400 N, F_m: 250 N, n_m: 2118 rpm, f_w: 1.2, target: L_h * (1 - 1e-6))",
            "CUT4102"
        },
        {
            "life as travel below the target",
            "L_s = rating_life_travel(C_a: 4400 N, F_m: 250 N, lead: 5 mm/rev)",
            "rating_life_travel(C_a: 4400 N, F_m: 250 N, lead: 5 mm/rev, target: L_s * (1 + 1e-6))",
            "rating_life_travel(C_a: 4400 N, F_m: 250 N, lead: 5 mm/rev, target: L_s * (1 - 1e-6))",
            "CUT4102"
        },
        {
            "static safety factor below 2",
            "",
            "static_safety_factor(C_0a: 10 kN, F_max: 5 kN * (1 + 1e-6))",
            "static_safety_factor(C_0a: 10 kN, F_max: 5 kN * (1 - 1e-6))",
            "CUT4102"
        },
        {
            "buckling safety factor below 2",
            "P = buckling_load(d_r: 12.5 mm, L: 820 mm, mounting: fixed_supported, S_y: 600 MPa)",
            "buckling_safety_factor(F_max: P / 2 * (1 + 1e-6), d_r: 12.5 mm, L: 820 mm, mounting: fixed_supported, S_y: 600 MPa)",
            "buckling_safety_factor(F_max: P / 2 * (1 - 1e-6), d_r: 12.5 mm, L: 820 mm, mounting: fixed_supported, S_y: 600 MPa)",
            "CUT4102"
        },
        {
            "Euler used below the critical slenderness",
            "L_1 = critical_slenderness(mounting: fixed_supported, S_y: 600 MPa) * 12.5 mm / 4",
            "euler_buckling_load(d_r: 12.5 mm, L: L_1 * (1 - 1e-6), mounting: fixed_supported, S_y: 600 MPa)",
            "euler_buckling_load(d_r: 12.5 mm, L: L_1 * (1 + 1e-6), mounting: fixed_supported, S_y: 600 MPa)",
            "CUT4104"
        },
        {
            "Johnson range (notice)",
            "L_1 = critical_slenderness(mounting: fixed_supported, S_y: 600 MPa) * 12.5 mm / 4",
            "buckling_load(d_r: 12.5 mm, L: L_1 * (1 - 1e-6), mounting: fixed_supported, S_y: 600 MPa)",
            "buckling_load(d_r: 12.5 mm, L: L_1 * (1 + 1e-6), mounting: fixed_supported, S_y: 600 MPa)",
            "CUT4101"
        },
        {
            "longest unsupported length outside the Euler range",
            "F_1 = pi * (12.5 mm)^2 / 4 * 600 MPa / 2 / 2",
            "max_unsupported_length(F_max: F_1 * (1 + 1e-6), d_r: 12.5 mm, mounting: fixed_supported, n_s: 2, S_y: 600 MPa)",
            "max_unsupported_length(F_max: F_1 * (1 - 1e-6), d_r: 12.5 mm, mounting: fixed_supported, n_s: 2, S_y: 600 MPa)",
            "CUT4104"
        },
        {
            "speed above 0.8 × the critical speed",
            "n_c = critical_speed(d_r: 25 mm, L: 1.5 m, mounting: fixed_supported)",
            "whirl_speed_ratio(n: 0.8 * n_c * (1 + 1e-6), d_r: 25 mm, L: 1.5 m, mounting: fixed_supported)",
            "whirl_speed_ratio(n: 0.8 * n_c * (1 - 1e-6), d_r: 25 mm, L: 1.5 m, mounting: fixed_supported)",
            "CUT4102"
        },
        {
            "speed over the nut's d_0 · n limit",
            "",
            "nut_speed_ratio(d_0: 32 mm, n: 70000 / 32 * 1 rpm * (1 + 1e-6), dn_max: 70000)",
            "nut_speed_ratio(d_0: 32 mm, n: 70000 / 32 * 1 rpm * (1 - 1e-6), dn_max: 70000)",
            "CUT4102"
        },
    };

    [Theory, MemberData(nameof(Thresholds))]
    public void Each_caution_fires_just_past_its_threshold_and_not_before(string name, string setup, string hazardous, string safe, string code) =>
        AssertThreshold(name, setup, hazardous, safe, code);

    [Fact]
    public void A_drive_efficiency_given_for_back_driving_is_flagged_by_its_kind()
    {
        var r = RunLibrary("""
            eta = eta_drive(d_0: 32 mm, lead: 10 mm/rev, mu: 0.005)
            eta_b = eta_backdrive(d_0: 32 mm, lead: 10 mm/rev, mu: 0.005)
            wrong = backdrive_torque(F: 5 kN, lead: 10 mm/rev, eta: eta)
            right = backdrive_torque(F: 5 kN, lead: 10 mm/rev, eta: eta_b)
            wrong_drive = drive_torque(F: 5 kN, lead: 10 mm/rev, eta: eta_b)
            """);
        Assert.Contains("CUT2204", r.CodesOn("wrong"));
        Assert.DoesNotContain("CUT2204", r.CodesOn("right"));
        Assert.Contains("CUT2204", r.CodesOn("wrong_drive"));
    }

    [Fact]
    public void Bad_input_gives_a_diagnostic_never_a_silent_non_finite_value()
    {
        Gen.Select(Gen.Double[-50, 50], Gen.Double[-100, 100], Gen.Double[-20, 20], Gen.Double[-0.05, 1.5], (a, b, c, d) => (a, b, c, d)).Sample(t =>
        {
            var (a, b, c, d) = t;
            var r = RunLibrary($"""
                x1 = drive_torque(F: {N(a)} kN, lead: {N(c)} mm/rev, eta: {N(d)})
                x2 = eta_drive(d_0: {N(b)} mm, lead: {N(c)} mm/rev, mu: {N(d)})
                x3 = eta_backdrive(d_0: {N(b)} mm, lead: {N(c)} mm/rev, mu: {N(d)})
                x4 = critical_speed(d_r: {N(b)} mm, L: {N(a)} mm, mounting: fixed_free)
                x5 = buckling_load(d_r: {N(b)} mm, L: {N(a)} mm, mounting: fixed_fixed, S_y: {N(c * 40)} MPa)
                x6 = rating_life_hours(C_a: {N(a)} kN, F_m: {N(c)} kN, n_m: {N(b)} rpm, f_w: {N(1 + d)})
                x7 = preloaded_nut_load(F: {N(a)} kN, F_pr: {N(c)} kN)
                """);
            foreach (var name in new[] { "x1", "x2", "x3", "x4", "x5", "x6", "x7" })
            {
                var value = r.Def(name).Value;
                if (value is null) Assert.True(r.HasErrors, $"{name} unknown without an error");
                else Assert.True(double.IsFinite(value.Quantity.Si), $"{name} = {value.Quantity.Si}");
            }
        }, iter: Iterations);
    }
}
