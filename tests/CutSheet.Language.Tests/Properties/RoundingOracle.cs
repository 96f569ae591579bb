using System.Globalization;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Judges whether a text is a finite double rounded to a number of significant figures,
/// without trusting the code that wrote it. Works in the value's own decade: with E the
/// decimal exponent of v (10^E ≤ |v| &lt; 10^(E+1)), both v and the text are scaled by 10^-E
/// into [1, 10] and must agree within half a unit in the last kept figure, 0.5·10^(1−digits).
/// Scaling the text's mantissa and exponent separately keeps texts such as 2e+308 (double.MaxValue
/// to one figure) readable although they overflow a double.
/// </summary>
public static class RoundingOracle
{
    /// <summary>
    /// Null when the text is v rounded to <paramref name="digits"/> figures; otherwise why not.
    /// <paramref name="slack"/> is the extra error allowed, in units of the leading figure.
    /// </summary>
    public static string? Check(string text, double v, int digits, double slack)
    {
        if (v == 0) return double.Parse(text, CultureInfo.InvariantCulture) == 0 ? null : $"'{text}' for zero";
        int e = (int)Math.Floor(Math.Log10(Math.Abs(v)));
        while (Scale(Math.Abs(v), -e) < 1) e--;
        while (Scale(Math.Abs(v), -e) >= 10) e++;
        double scaledValue = Scale(v, -e);

        int mark = text.IndexOf('e');
        double mantissa = double.Parse(mark < 0 ? text : text[..mark], CultureInfo.InvariantCulture);
        int exponent = mark < 0 ? 0 : int.Parse(text[(mark + 1)..], NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
        double scaledText = Scale(mantissa, exponent - e);

        double half = 0.5 * Math.Pow(10, 1 - digits);
        double error = Math.Abs(scaledText - scaledValue);
        return error <= half + slack
            ? null
            : $"'{text}' differs from {v.ToString("R", CultureInfo.InvariantCulture)} by {error:E3} in units of 10^{e}, more than half the last figure ({half:E1})";
    }

    /// <summary>x·10^k in two steps, so that neither factor over- or underflows for |k| up to about 640.</summary>
    private static double Scale(double x, int k) => x * Math.Pow(10, k / 2) * Math.Pow(10, k - k / 2);
}
