namespace CutSheet.Language.Evaluation;

/// <summary>Recognises exponents that are exact small fractions (1/2, 1/3, -2/3) so that dimensions stay whole.</summary>
internal static class Rational
{
    public static bool TryFrom(double x, out int numerator, out int denominator)
    {
        for (int q = 1; q <= 12; q++)
        {
            double p = Math.Round(x * q);
            if (Math.Abs(p) <= 1200 && Math.Abs(x * q - p) <= 1e-9 * Math.Max(1, Math.Abs(x * q)))
            {
                numerator = (int)p;
                denominator = q;
                return true;
            }
        }
        numerator = 0;
        denominator = 1;
        return false;
    }
}
