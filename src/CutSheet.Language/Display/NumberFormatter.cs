using System.Globalization;
using System.Text;

namespace CutSheet.Language.Display;

/// <summary>
/// Writes numbers for people: a given count of significant figures, rounded half away from
/// zero on the decimal value the double stands for, read to 15 significant figures first so
/// that floating-point noise does not decide (2.675 rounds to 2.68, and 60.325 + 1 to 61.33,
/// although both doubles lie a hair below the half), trailing zeros kept because they state the
/// precision, plain notation from 10⁻⁴ to below 10¹⁰ (judged
/// after rounding) and scientific notation (<c>1.235e-05</c>) outside it. Always the invariant
/// culture: a decimal point, no group separators. Never throws.
/// </summary>
public static class NumberFormatter
{
    public static string Format(double value, int digits)
    {
        digits = Math.Clamp(digits, 1, 17);
        if (double.IsNaN(value)) return "NaN";
        if (double.IsInfinity(value)) return value > 0 ? "∞" : "−∞";
        if (value == 0) return digits > 1 ? "0." + new string('0', digits - 1) : "0";

        var (negative, mantissa, exponent) = Decompose(value, digits);
        var (rounded, exp10) = Round(mantissa, exponent, digits);
        var sb = new StringBuilder(digits + 8);
        if (negative) sb.Append('-');
        if (exp10 >= -4 && exp10 < 10) WritePlain(sb, rounded, exp10);
        else WriteScientific(sb, rounded, exp10);
        return sb.ToString();
    }

    /// <summary>The shortest text that reads back to exactly the same double (for JSON and tests).</summary>
    public static string RoundTrip(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    /// <summary>The decimal digits of the value (15 significant, or the shortest exact text when more are asked for) and the power of ten of the first digit.</summary>
    private static (bool Negative, string Digits, int Exponent) Decompose(double value, int digits)
    {
        string r = Math.Abs(value).ToString(digits <= 15 ? "E14" : "R", CultureInfo.InvariantCulture);
        // "R" may be plain or scientific; normalise it to digits and an exponent.
        int ePos = r.IndexOfAny(['E', 'e']);
        int exp = 0;
        string body = r;
        if (ePos >= 0)
        {
            exp = int.Parse(r.AsSpan(ePos + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
            body = r[..ePos];
        }
        int dot = body.IndexOf('.');
        string intPart = dot < 0 ? body : body[..dot];
        string fracPart = dot < 0 ? "" : body[(dot + 1)..];
        string all = (intPart + fracPart).TrimStart('0');
        int leadingZeros = (intPart + fracPart).Length - all.Length;
        int firstDigitExponent = intPart.Length - 1 - leadingZeros + exp;
        all = all.TrimEnd('0');
        if (all.Length == 0) all = "0";
        return (value < 0, all, firstDigitExponent);
    }

    /// <summary>Rounds a digit string half away from zero to <paramref name="digits"/> figures.</summary>
    private static (string Digits, int Exponent) Round(string mantissa, int exponent, int digits)
    {
        if (mantissa.Length <= digits) return (mantissa.PadRight(digits, '0'), exponent);
        var d = mantissa[..digits].ToCharArray();
        if (mantissa[digits] >= '5')
        {
            int i = digits - 1;
            while (i >= 0)
            {
                if (d[i] == '9') { d[i] = '0'; i--; }
                else { d[i]++; break; }
            }
            if (i < 0) return ("1" + new string(d, 0, digits - 1), exponent + 1);
        }
        return (new string(d), exponent);
    }

    private static void WritePlain(StringBuilder sb, string digits, int exp10)
    {
        if (exp10 < 0)
        {
            sb.Append("0.").Append('0', -exp10 - 1).Append(digits);
            return;
        }
        if (digits.Length <= exp10 + 1)
        {
            sb.Append(digits).Append('0', exp10 + 1 - digits.Length);
            return;
        }
        sb.Append(digits, 0, exp10 + 1).Append('.').Append(digits, exp10 + 1, digits.Length - exp10 - 1);
    }

    private static void WriteScientific(StringBuilder sb, string digits, int exp10)
    {
        sb.Append(digits[0]);
        if (digits.Length > 1) sb.Append('.').Append(digits, 1, digits.Length - 1);
        sb.Append('e').Append(exp10 < 0 ? '-' : '+').Append(Math.Abs(exp10).ToString("00", CultureInfo.InvariantCulture));
    }
}
