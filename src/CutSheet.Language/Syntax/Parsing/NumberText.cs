using System.Buffers;
using System.Globalization;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// Reads the text of a number token: decimals, exponents, integer fractions and mixed numbers.
/// It reads the source text in place, with no substring. It looks at the characters rather than
/// at the tokenizer's <see cref="TokenFlags.Fraction"/> flag because expressions parsed through the
/// statement grammar arrive without flags; a search for a space or a slash in a few characters
/// costs next to nothing.
/// </summary>
internal static class NumberText
{
    /// <summary>
    /// The spaces that may separate the whole part of a mixed number from its fraction: every space
    /// <see cref="Tokenizer.IsSpace"/> admits there, since the tokenizer decides what a mixed number is.
    /// </summary>
    private const string MixedNumberSpaceChars = " \t\f\v\u00A0\u202F\u2009\u2007\u2002\u2003\u200A\uFEFF";

    private static readonly SearchValues<char> MixedNumberSpaces = SearchValues.Create(MixedNumberSpaceChars);

    /// <summary>What can take a number out of the finite range: an exponent, or a fraction's zero denominator.</summary>
    private static readonly SearchValues<char> ExponentOrFraction = SearchValues.Create("eE/");

    /// <summary>
    /// The longest plain decimal (no exponent) that is certainly finite: 308 characters stay below
    /// <see cref="double.MaxValue"/> (about 1.8 × 10³⁰⁸).
    /// </summary>
    private const int LongestCertainlyFinite = 308;

    /// <summary>The powers of ten that a double holds exactly: 10⁰ to 10²².</summary>
    private static readonly double[] ExactPowersOfTen =
        [1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22];

    /// <summary>Up to 15 digits the digits as an integer stay below 2⁵³, so the double holds them exactly.</summary>
    private const int MostExactDigits = 15;

    /// <summary>True when the number's value is finite; the common number is not parsed at all to tell.</summary>
    public static bool IsFinite(ReadOnlySpan<char> text) =>
        TryParseShortDecimal(text, out _) || (text.Length <= LongestCertainlyFinite && !text.ContainsAny(ExponentOrFraction))
        || double.IsFinite(Parse(text));

    /// <summary>The value of a number's text, a fraction or mixed number included.</summary>
    public static double Parse(ReadOnlySpan<char> text)
    {
        // Nearly every number is a short decimal; any other character (a space, a slash, an exponent) sends it on.
        if (TryParseShortDecimal(text, out double value)) return value;
        int space = text.IndexOfAny(MixedNumberSpaces);
        if (space > 0)
        {
            double whole = Parse(text[..space]);
            return whole + Parse(text[(space + 1)..].Trim(MixedNumberSpaceChars));
        }
        int slash = text.IndexOf('/');
        if (slash > 0)
        {
            double n = Parse(text[..slash]);
            double d = Parse(text[(slash + 1)..]);
            return n / d;
        }
        if (text.EndsWith('.')) text = text[..^1];
        // A decimal comma is reported by the sheet parser; where a value is still read, the comma counts as a point.
        if (text.Contains(','))
            return double.Parse(text.ToString().Replace(',', '.'), NumberStyles.Float, CultureInfo.InvariantCulture);
        return double.Parse(text, NumberStyles.Float, CultureInfo.InvariantCulture);
    }

    /// <summary>
    /// Digits with an optional point (a trailing one too), at most 15 digits: nearly every number in a sheet. The digits
    /// as an integer and the power of ten are both exact doubles, and one IEEE division rounds
    /// correctly, so the quotient is the correctly rounded value <see cref="double.Parse(string)"/>
    /// gives too, without its general machinery.
    /// </summary>
    private static bool TryParseShortDecimal(ReadOnlySpan<char> text, out double value)
    {
        value = 0;
        if (text.IsEmpty || text.Length > MostExactDigits + 1) return false;
        ulong digits = 0;
        int count = 0, decimals = -1;
        foreach (char c in text)
        {
            if (char.IsAsciiDigit(c))
            {
                digits = digits * 10 + (ulong)(c - '0');
                count++;
                if (decimals >= 0) decimals++;
            }
            else if (c == '.' && decimals < 0) decimals = 0;
            else return false;
        }
        if (count == 0 || count > MostExactDigits) return false;
        value = decimals > 0 ? digits / ExactPowersOfTen[decimals] : digits;
        return true;
    }
}
