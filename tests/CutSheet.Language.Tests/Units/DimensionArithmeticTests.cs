using CutSheet.Language.Units;

namespace CutSheet.Language.Tests.Units;

/// <summary>
/// Dimension arithmetic against its definition, exponent by exponent (ISO 80000-1: the dimension of
/// a product is the sum of the exponents, of a quotient their difference; the SI part is the first
/// seven). The pairs cover every position, both signs and the ±60 limit; the expectations are
/// written out here from that definition, not taken from the code under test.
/// </summary>
public class DimensionArithmeticTests
{
    private static Dimension Make(int[] exponents)
    {
        var d = Dimension.None;
        for (int k = 0; k < Dimension.Count; k++) if (exponents[k] != 0) d *= Dimension.Of(k, exponents[k]);
        return d;
    }

    public static TheoryData<int[], int[]> Pairs()
    {
        var data = new TheoryData<int[], int[]>();
        var random = new Random(80000);
        for (int n = 0; n < 40; n++)
        {
            int[] a = new int[Dimension.Count], b = new int[Dimension.Count];
            for (int k = 0; k < Dimension.Count; k++)
            {
                // Mostly small exponents, sometimes at or past the limit, often zero.
                a[k] = random.Next(4) == 0 ? random.Next(-60, 61) : random.Next(-3, 4) * random.Next(2);
                b[k] = random.Next(4) == 0 ? random.Next(-60, 61) : random.Next(-3, 4) * random.Next(2);
            }
            if (n % 5 == 0) b = (int[])a.Clone();
            if (n % 7 == 0) Array.Copy(a, b, Dimension.SiCount);
            data.Add(a, b);
        }
        data.Add(new int[Dimension.Count], new int[Dimension.Count]);
        return data;
    }

    [Theory]
    [MemberData(nameof(Pairs))]
    public void Operations_follow_the_exponents(int[] a, int[] b)
    {
        var da = Make(a);
        var db = Make(b);
        bool canMultiply = true, canDivide = true, siEqual = true, equal = true, soft = false, none = true;
        for (int k = 0; k < Dimension.Count; k++)
        {
            Assert.Equal(a[k], da[k]);
            canMultiply &= Math.Abs(a[k] + b[k]) <= Dimension.MaxExponent;
            canDivide &= Math.Abs(a[k] - b[k]) <= Dimension.MaxExponent;
            if (k < Dimension.SiCount) siEqual &= a[k] == b[k];
            equal &= a[k] == b[k];
            if (k >= Dimension.SiCount) soft |= a[k] != 0;
            none &= a[k] == 0;
        }
        Assert.Equal(canMultiply, Dimension.CanCombine(da, db, 1));
        Assert.Equal(canDivide, Dimension.CanCombine(da, db, -1));
        Assert.Equal(siEqual, da.SiEquals(db));
        Assert.Equal(equal, da == db);
        Assert.Equal(equal, da.Equals((object)db));
        if (equal) Assert.Equal(da.GetHashCode(), db.GetHashCode());
        Assert.Equal(soft, da.HasSoft);
        Assert.Equal(none, da.IsNone);
        var product = da * db;
        var quotient = da / db;
        var si = da.Si;
        for (int k = 0; k < Dimension.Count; k++)
        {
            if (canMultiply) Assert.Equal(a[k] + b[k], product[k]);
            if (canDivide) Assert.Equal(a[k] - b[k], quotient[k]);
            Assert.Equal(k < Dimension.SiCount ? a[k] : 0, si[k]);
        }
        Assert.Throws<IndexOutOfRangeException>(() => da[Dimension.Count]);
    }
}
