using System.Text;

namespace CutSheet.Language.Units;

/// <summary>Writes and reads Unicode superscript integers (², ⁻¹) used in unit text.</summary>
public static class Superscript
{
    private const string Digits = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    public static string Of(int value)
    {
        var sb = new StringBuilder();
        if (value < 0) sb.Append('⁻');
        foreach (char c in Math.Abs(value).ToString(System.Globalization.CultureInfo.InvariantCulture)) sb.Append(Digits[c - '0']);
        return sb.ToString();
    }

    public static bool IsSuperscriptChar(char c) => Digits.IndexOf(c) >= 0 || c == '⁻' || c == '⁺';

    /// <summary>The digit value of a superscript digit, or -1.</summary>
    public static int DigitValue(char c) => Digits.IndexOf(c);
}
