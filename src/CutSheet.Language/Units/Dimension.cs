using System.Runtime.CompilerServices;
using System.Runtime.Intrinsics;
using System.Text;

namespace CutSheet.Language.Units;

/// <summary>
/// The exponents of a quantity: the seven SI base dimensions (ISO 80000-1) followed by
/// the "soft" dimension-one factors the trade keeps track of — plane angle (rad) and the
/// counted entities rev, tooth, start, cycle, div and stroke. Soft factors have dimension
/// one in SI, so they never block arithmetic; they let the checker tell a lead (mm/rev)
/// from a pitch (mm), a rotational frequency (rev/min) from an angular velocity (rad/s),
/// and apply the 2π bridge only where the user asks for it with <c>as</c>.
/// </summary>
public readonly struct Dimension : IEquatable<Dimension>
{
    public const int Count = 14;

    /// <summary>The largest exponent a dimension may reach; beyond it arithmetic is refused rather than wrapped.</summary>
    public const int MaxExponent = 60;
    public const int SiCount = 7;

    public const int Length = 0, Mass = 1, Time = 2, Current = 3, Temperature = 4, Amount = 5, Luminosity = 6;
    public const int Angle = 7, Rev = 8, Tooth = 9, Start = 10, Cycle = 11, Division = 12, Stroke = 13;

    private static readonly string[] SiSymbols = ["L", "M", "T", "I", "Θ", "N", "J"];
    private static readonly string[] SoftNames = ["rad", "rev", "tooth", "start", "cycle", "div", "stroke"];

    private readonly Exponents _e;

    public static readonly Dimension None = default;

    private Dimension(Exponents e) => _e = e;

    public sbyte this[int index] => (uint)index < Count ? _e[index] : throw new IndexOutOfRangeException();

    public static Dimension Of(int index, int exponent = 1)
    {
        if ((uint)index >= Count) throw new IndexOutOfRangeException();
        var e = new Exponents();
        e[index] = (sbyte)exponent;
        return new Dimension(e);
    }

    /// <summary>
    /// The exponents as one 16-byte vector (the last two bytes are padding and always zero), so that
    /// products, comparisons and hashes, done for every operation a sheet evaluates, take a few
    /// instructions instead of a loop over fourteen bytes.
    /// </summary>
    private Vector128<sbyte> Vector => Unsafe.ReadUnaligned<Vector128<sbyte>>(ref Unsafe.As<Exponents, byte>(ref Unsafe.AsRef(in _e)));

    private static Dimension FromVector(Vector128<sbyte> v)
    {
        var e = new Exponents();
        Unsafe.WriteUnaligned(ref Unsafe.As<Exponents, byte>(ref e), v);
        return new Dimension(e);
    }

    /// <summary>Selects the seven SI exponents of a vector.</summary>
    private static readonly Vector128<sbyte> SiMask = Vector128.Create(-1, -1, -1, -1, -1, -1, -1, 0, 0, 0, 0, 0, 0, 0, 0, (sbyte)0);

    public static Dimension FromSi(int l, int m, int t, int i = 0, int th = 0, int n = 0, int j = 0)
    {
        var e = new Exponents();
        e[0] = (sbyte)l; e[1] = (sbyte)m; e[2] = (sbyte)t; e[3] = (sbyte)i; e[4] = (sbyte)th; e[5] = (sbyte)n; e[6] = (sbyte)j;
        return new Dimension(e);
    }

    // Byte-wise and wrapping, as the casts of a loop over the exponents would be; CanCombine guards the range.
    public static Dimension operator *(Dimension a, Dimension b) => FromVector(a.Vector + b.Vector);

    public static Dimension operator /(Dimension a, Dimension b) => FromVector(a.Vector - b.Vector);

    public Dimension Pow(int n)
    {
        var e = new Exponents();
        for (int k = 0; k < Count; k++) e[k] = (sbyte)(_e[k] * n);
        return new Dimension(e);
    }

    /// <summary>True when a·b (sign 1) or a/b (sign −1) keeps every exponent within ±<see cref="MaxExponent"/>.</summary>
    public static bool CanCombine(Dimension a, Dimension b, int sign)
    {
        // Widened to 16 bits, where no sum or difference of two exponents overflows.
        var (aLow, aHigh) = Vector128.Widen(a.Vector);
        var (bLow, bHigh) = Vector128.Widen(b.Vector);
        if (sign < 0)
        {
            bLow = -bLow;
            bHigh = -bHigh;
        }
        var limit = Vector128.Create((short)MaxExponent);
        return !Vector128.GreaterThanAny(Vector128.Abs(aLow + bLow), limit) && !Vector128.GreaterThanAny(Vector128.Abs(aHigh + bHigh), limit);
    }

    /// <summary>True when raising to p/q keeps every exponent within ±<see cref="MaxExponent"/>.</summary>
    public bool CanPow(int p, int q)
    {
        for (int k = 0; k < Count; k++)
        {
            if (Math.Abs((long)_e[k] * p) > (long)MaxExponent * Math.Abs(q)) return false;
        }
        return true;
    }

    /// <summary>Raises to p/q; false when an exponent would not stay an integer (check <see cref="CanPow"/> first).</summary>
    public bool TryPow(int p, int q, out Dimension result)
    {
        var e = new Exponents();
        for (int k = 0; k < Count; k++)
        {
            int v = _e[k] * p;
            if (v % q != 0 || Math.Abs(v / q) > MaxExponent) { result = default; return false; }
            e[k] = (sbyte)(v / q);
        }
        result = new Dimension(e);
        return true;
    }

    /// <summary>The same dimension with every soft factor removed (its SI part).</summary>
    public Dimension Si => FromVector(Vector & SiMask);

    public bool IsDimensionless => SiEquals(None);

    public bool IsNone => Vector == Vector128<sbyte>.Zero;

    public bool HasSoft => Vector128.AndNot(Vector, SiMask) != Vector128<sbyte>.Zero;

    /// <summary>Rotation content: the angle exponent plus the revolution exponent.</summary>
    public int RotationOrder => _e[Angle] + _e[Rev];

    public bool SiEquals(Dimension other) => ((Vector ^ other.Vector) & SiMask) == Vector128<sbyte>.Zero;

    public bool Equals(Dimension other) => Vector == other.Vector;

    public override bool Equals(object? obj) => obj is Dimension d && Equals(d);

    public override int GetHashCode()
    {
        var halves = Vector.AsInt64();
        return HashCode.Combine(halves.GetElement(0), halves.GetElement(1));
    }

    public static bool operator ==(Dimension a, Dimension b) => a.Equals(b);
    public static bool operator !=(Dimension a, Dimension b) => !a.Equals(b);

    /// <summary>The SI part as ISO 80000-1 dimension symbols, e.g. <c>L M T⁻²</c>; "1" for dimension one.</summary>
    public string ToSiString()
    {
        var sb = new StringBuilder();
        for (int k = 0; k < SiCount; k++)
        {
            if (_e[k] == 0) continue;
            if (sb.Length > 0) sb.Append(' ');
            sb.Append(SiSymbols[k]);
            if (_e[k] != 1) sb.Append(Superscript.Of(_e[k]));
        }
        return sb.Length == 0 ? "1" : sb.ToString();
    }

    /// <summary>The soft part, e.g. <c>rev⁻¹</c>, or empty.</summary>
    public string ToSoftString()
    {
        var sb = new StringBuilder();
        for (int k = SiCount; k < Count; k++)
        {
            if (_e[k] == 0) continue;
            if (sb.Length > 0) sb.Append(' ');
            sb.Append(SoftNames[k - SiCount]);
            if (_e[k] != 1) sb.Append(Superscript.Of(_e[k]));
        }
        return sb.ToString();
    }

    public override string ToString()
    {
        string soft = ToSoftString();
        return soft.Length == 0 ? ToSiString() : ToSiString() + " · " + soft;
    }

    public static string SoftName(int index) => SoftNames[index - SiCount];

    /// <summary>Fourteen exponents and two bytes of padding, always zero, to fill a 16-byte vector.</summary>
    [InlineArray(Count + 2)]
    private struct Exponents
    {
        private sbyte _element0;
    }
}
