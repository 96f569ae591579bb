using System.Globalization;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>Reads the text of a number token: decimals, exponents, integer fractions and mixed numbers.</summary>
internal static class NumberText
{
    public static double Parse(string text)
    {
        int space = text.IndexOfAny([' ', '\t', '\u00A0', '\u202F', '\u2009']);
        if (space > 0)
        {
            double whole = Parse(text[..space]);
            return whole + Parse(text[(space + 1)..].Trim());
        }
        int slash = text.IndexOf('/');
        if (slash > 0)
        {
            double n = Parse(text[..slash]);
            double d = Parse(text[(slash + 1)..]);
            return n / d;
        }
        if (text.EndsWith('.')) text = text[..^1];
        return double.Parse(text.Replace(',', '.'), NumberStyles.Float, CultureInfo.InvariantCulture);
    }
}
