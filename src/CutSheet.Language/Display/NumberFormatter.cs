using System.Globalization;

namespace CutSheet.Language.Display;

/// <summary>
/// Writes numbers for people: a given count of significant figures, rounded half away from
/// zero on the decimal value the double stands for (so 2.675 rounds to 2.68 at three figures,
/// as a reader expects), trailing zeros kept because they state the precision, plain notation
/// from 10⁻⁴ to below 10¹⁰ and scientific notation (<c>1.235e-05</c>) outside it. Always the
/// invariant culture: a decimal point, no group separators.
/// </summary>
public static class NumberFormatter
{
    public static string Format(double value, int digits)
    {
        digits = Math.Clamp(digits, 1, 15);
        if (double.IsNaN(value)) return "NaN";
        if (double.IsInfinity(value)) return value > 0 ? "∞" : "−∞";
        if (value == 0) return digits > 1 ? "0." + new string('0', digits - 1) : "0";
        double abs = Math.Abs(value);
        if (abs >= 1e-4 && abs < 1e10) return Plain(value, digits);
        return Scientific(value, digits);
    }

    /// <summary>The shortest text that reads back to exactly the same double (for JSON and tests).</summary>
    public static string RoundTrip(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static string Plain(double value, int digits)
    {
        decimal d = (decimal)value;
        int exponent = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        decimal rounded = RoundSignificant(d, digits, exponent);
        if (rounded != 0)
        {
            int e2 = (int)Math.Floor(Math.Log10((double)Math.Abs(rounded)));
            if (e2 != exponent) { exponent = e2; rounded = RoundSignificant(d, digits, exponent); }
        }
        int decimals = Math.Max(0, digits - 1 - exponent);
        return rounded.ToString("F" + decimals, CultureInfo.InvariantCulture);
    }

    private static decimal RoundSignificant(decimal d, int digits, int exponent)
    {
        int decimals = digits - 1 - exponent;
        if (decimals >= 0) return Math.Round(d, Math.Min(decimals, 28), MidpointRounding.AwayFromZero);
        decimal scale = Pow10(-decimals);
        return Math.Round(d / scale, 0, MidpointRounding.AwayFromZero) * scale;
    }

    private static decimal Pow10(int n)
    {
        decimal r = 1;
        for (int i = 0; i < n; i++) r *= 10;
        return r;
    }

    private static string Scientific(double value, int digits)
    {
        int exponent = (int)Math.Floor(Math.Log10(Math.Abs(value)));
        double mantissa = value / Math.Pow(10, exponent);
        string m = Plain(mantissa, digits);
        if (m.StartsWith("10", StringComparison.Ordinal) || m.StartsWith("-10", StringComparison.Ordinal))
        {
            exponent++;
            m = Plain(value / Math.Pow(10, exponent), digits);
        }
        return m + "e" + (exponent < 0 ? "-" : "+") + Math.Abs(exponent).ToString("00", CultureInfo.InvariantCulture);
    }
}
