using System.Globalization;
using System.Runtime.CompilerServices;

namespace CutSheet.Bench;

/// <summary>
/// The floor: the sheet's arithmetic on plain doubles in SI, line for line in the generator's
/// layout, every value stored as the sheet stores it. The constants are parsed at run time and
/// the result is returned and checked, so the JIT can neither fold nor drop the work.
/// </summary>
internal sealed class Floor
{
    private readonly double _growth, _step, _mm, _fGrowth, _lbfStep, _x0, _f0, _inch, _lead, _vc, _min, _limit, _deg, _mpa;
    private readonly double[] _x, _f, _side;
    private int _passed;

    public Floor(int lineCount)
    {
        static double P(string s) => double.Parse(s, CultureInfo.InvariantCulture);
        _growth = P("1.0001"); _step = P("0.25"); _mm = P("0.001"); _fGrowth = P("0.9999");
        _lbfStep = P("2") * P("4.4482216152605"); _x0 = P("16") * _mm; _f0 = P("1.2") * P("1000");
        _inch = P("0.0254"); _lead = P("5") * _mm; _vc = P("200") / P("60"); _min = P("60"); _limit = P("10");
        _deg = P("180") / Math.PI; _mpa = P("1e6");
        _x = new double[lineCount];
        _f = new double[lineCount];
        _side = new double[lineCount];
    }

    public int LastX { get; private set; }

    public int LastF { get; private set; }

    /// <summary>Runs the whole sheet once; returns a checksum that depends on every value.</summary>
    [MethodImpl(MethodImplOptions.NoInlining)]
    public double Run(int lineCount)
    {
        var x = _x;
        var f = _f;
        var side = _side;
        int j = 0, m = 0, s = 0;
        x[0] = _x0;
        f[0] = _f0;
        _passed = 0;
        for (int block = 0; block < lineCount / SheetGenerator.LinesPerBlock; block++)
        {
            for (int g = 0; g < SheetGenerator.GroupsPerBlock; g++)
            {
                int chain = block == 0 && g == 0 ? SheetGenerator.ChainPerGroup - 3 : SheetGenerator.ChainPerGroup;
                for (int k = 0; k < chain; k++, j++) x[j + 1] = x[j] * _growth + _step * _mm;
                f[m + 1] = f[m] * _fGrowth + _lbfStep;
                m++;
                var (a, b) = SheetGenerator.Sides[g];
                side[s++] = SideLine(a, x[j], f[m]);
                side[s++] = SideLine(b, x[j], f[m]);
            }
        }
        LastX = j;
        LastF = m;
        double sum = _passed;
        for (int i = 0; i < s; i++) sum += side[i];
        return sum + x[j] + f[m];
    }

    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    private double SideLine(LineKind kind, double x, double f)
    {
        switch (kind)
        {
            case LineKind.Conversion:
                return x / _inch;
            case LineKind.Torque:
                return f * _lead / (2 * Math.PI);
            case LineKind.LeadAngle:
                // The library function's two require clauses, then atan(lead / (π d)) shown in degrees.
                if (!(x > 0) || !(_lead > 0)) return double.NaN;
                return Math.Atan(_lead / (Math.PI * x)) * _deg;
            case LineKind.Speed:
                return _vc / (Math.PI * x) * _min;
            case LineKind.Pressure:
                return f / (x * x) / _mpa;
            case LineKind.Check:
                if (x <= _limit) _passed++;
                return x / _limit;
            default:
                return 0;
        }
    }

    public double X(int j) => _x[j];

    public double Force(int m) => _f[m];
}
