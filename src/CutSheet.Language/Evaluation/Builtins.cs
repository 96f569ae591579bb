using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// The built-in constants and functions. Trigonometric functions take angles (a plain number
/// is radians, a revolution count is 2π per revolution); inverse functions return angles.
/// </summary>
internal static class Builtins
{
    /// <summary>π; g_n = 9.806 65 m/s² (standard acceleration of gravity, ISO 80000-3, exact).</summary>
    public static readonly IReadOnlyDictionary<string, Quantity> Constants = new Dictionary<string, Quantity>(StringComparer.Ordinal)
    {
        ["pi"] = new(Math.PI, Dimension.None),
        ["π"] = new(Math.PI, Dimension.None),
        ["g_n"] = new(9.80665, Dimension.FromSi(1, 0, -2)),
    };

    /// <summary>Name, signature and one-line description of each built-in function, for docs and completion.</summary>
    public static readonly (string Name, string Signature, string Description)[] Functions =
    [
        ("sin", "sin(angle)", "sine of an angle (a revolution count is 2π per revolution)"),
        ("cos", "cos(angle)", "cosine of an angle"),
        ("tan", "tan(angle)", "tangent of an angle"),
        ("asin", "asin(ratio): plane_angle", "inverse sine, an angle"),
        ("acos", "acos(ratio): plane_angle", "inverse cosine, an angle"),
        ("atan", "atan(ratio): plane_angle", "inverse tangent, an angle"),
        ("atan2", "atan2(y, x): plane_angle", "angle of the point (x, y); y and x of one dimension"),
        ("sqrt", "sqrt(x)", "square root; every dimension exponent must be even"),
        ("cbrt", "cbrt(x)", "cube root; every dimension exponent must divide by 3"),
        ("abs", "abs(x)", "absolute value"),
        ("min", "min(a, b, …) or min(list)", "smallest value; all of one dimension"),
        ("max", "max(a, b, …) or max(list)", "largest value; all of one dimension"),
        ("exp", "exp(ratio)", "e to the power of a plain number"),
        ("ln", "ln(ratio)", "natural logarithm of a positive plain number"),
        ("log10", "log10(ratio)", "decimal logarithm of a positive plain number"),
        ("round", "round(x, step)", "x rounded to a multiple of step (half away from zero)"),
        ("floor", "floor(x, step)", "the largest multiple of step not above x"),
        ("ceil", "ceil(x, step)", "the smallest multiple of step not below x"),
        ("sum", "sum(list)", "sum of a list"),
        ("mean", "mean(list)", "arithmetic mean of a list"),
        ("rms", "rms(list)", "root mean square of a list"),
        ("count", "count(list)", "number of values in a list"),
        ("power_mean", "power_mean(list, p)", "(Σ xᵢᵖ / n)^(1/p), e.g. the cubic mean of a load spectrum"),
        ("interpolate", "interpolate(x, xs, ys)", "y at x by straight lines between the points (xs ascending), e.g. a motor's torque–speed curve; outside the points is an error"),
    ];

    public static IEnumerable<string> FunctionNames => Functions.Select(f => f.Name);

    private static readonly HashSet<string> FunctionSet = new(Functions.Select(f => f.Name), StringComparer.Ordinal);

    public static bool IsFunction(string name) => FunctionSet.Contains(name);

    /// <summary>Names of constants and functions together: declaring a name asks both, once per name of the sheet.</summary>
    private static readonly HashSet<string> ReservedSet = new(Constants.Keys.Concat(FunctionSet), StringComparer.Ordinal);

    /// <summary>True for the name of a built-in constant or function, which a sheet may not declare.</summary>
    public static bool IsBuiltinName(string name) => ReservedSet.Contains(name);

    public static Value Call(string name, Value[] args, CallSyntax call, out (string Code, TextSpan Span, string Message)? problem)
    {
        problem = null;
        var span = call.Span;
        (string, TextSpan, string) Fail(string code, TextSpan at, string message) => (code, at, message);
        TextSpan ArgSpan(int i) => i < call.Arguments.Count ? call.Arguments[i].Value.Span : span;

        int expected = name switch
        {
            "atan2" or "round" or "floor" or "ceil" or "power_mean" => 2,
            "interpolate" => 3,
            "min" or "max" => -1,
            _ => 1,
        };
        if (expected >= 0 && args.Length != expected)
        {
            problem = Fail(DiagnosticCodes.ArgumentList, span, expected > args.Length
                ? DiagnosticMessages.MissingArgument(name, $"{args.Length + 1}")
                : DiagnosticMessages.TooManyArguments(name, expected));
            return Value.Unknown;
        }
        if (expected < 0 && args.Length == 0)
        {
            problem = Fail(DiagnosticCodes.ArgumentList, span, DiagnosticMessages.MissingArgument(name, "1"));
            return Value.Unknown;
        }

        switch (name)
        {
            case "sin" or "cos" or "tan":
            {
                if (!Scalar(args, 0, ArgSpan(0), out var q, ref problem)) return Value.Unknown;
                if (!q.Dimension.IsDimensionless)
                {
                    problem = Fail(DiagnosticCodes.ArgumentNotDimensionless, ArgSpan(0), DiagnosticMessages.ArgumentNotDimensionless(name, Describe(q)));
                    return Value.Unknown;
                }
                double radians = q.Si * Math.Pow(2 * Math.PI, q.Dimension[Dimension.Rev]);
                double r = name == "sin" ? Math.Sin(radians) : name == "cos" ? Math.Cos(radians) : Math.Tan(radians);
                return Value.Of(new Quantity(r, Dimension.None));
            }
            case "asin" or "acos" or "atan":
            {
                if (!Plain(args, 0, ArgSpan(0), name, out double x, ref problem)) return Value.Unknown;
                if (name != "atan" && (x < -1 - 1e-12 || x > 1 + 1e-12))
                {
                    problem = Fail(DiagnosticCodes.DomainError, ArgSpan(0), DiagnosticMessages.DomainError(name, DiagnosticMessages.InverseTrigRange));
                    return Value.Unknown;
                }
                x = Math.Clamp(x, -1e300, 1e300);
                double r = name == "asin" ? Math.Asin(Math.Clamp(x, -1, 1)) : name == "acos" ? Math.Acos(Math.Clamp(x, -1, 1)) : Math.Atan(x);
                return Value.Of(new Quantity(r, Dimension.Of(Dimension.Angle)));
            }
            case "atan2":
            {
                if (!Scalar(args, 0, ArgSpan(0), out var y, ref problem) || !Scalar(args, 1, ArgSpan(1), out var x, ref problem)) return Value.Unknown;
                if (!y.Dimension.SiEquals(x.Dimension))
                {
                    problem = Fail(DiagnosticCodes.DimensionMismatch, span, DiagnosticMessages.DimensionMismatch("take atan2 of", Describe(y), y.Dimension, Describe(x), x.Dimension));
                    return Value.Unknown;
                }
                return Value.Of(new Quantity(Math.Atan2(y.Si, x.Si), Dimension.Of(Dimension.Angle)));
            }
            case "sqrt" or "cbrt":
            {
                if (!Scalar(args, 0, ArgSpan(0), out var q, ref problem)) return Value.Unknown;
                int root = name == "sqrt" ? 2 : 3;
                if (!q.Dimension.TryPow(1, root, out var dim))
                {
                    problem = Fail(DiagnosticCodes.NonIntegerExponent, span, DiagnosticMessages.NonIntegerExponent(Describe(q), root == 2 ? "1/2" : "1/3"));
                    return Value.Unknown;
                }
                if (root == 2 && q.Si < 0)
                {
                    problem = Fail(DiagnosticCodes.DomainError, ArgSpan(0), DiagnosticMessages.DomainError(name, DiagnosticMessages.NegativeSquareRoot));
                    return Value.Unknown;
                }
                return Value.Of(new Quantity(root == 2 ? Math.Sqrt(q.Si) : Math.Cbrt(q.Si), dim));
            }
            case "abs":
            {
                if (args[0].Kind == ValueKind.List) return Value.Of(args[0].List! with { Values = args[0].List!.Values.Select(Math.Abs).ToArray() });
                if (!Scalar(args, 0, ArgSpan(0), out var q, ref problem)) return Value.Unknown;
                return Value.Of(q with { Si = Math.Abs(q.Si) });
            }
            case "min" or "max":
                return Extreme(name, args, call, ref problem);
            case "exp" or "ln" or "log10":
            {
                if (!Plain(args, 0, ArgSpan(0), name, out double x, ref problem)) return Value.Unknown;
                if (name != "exp" && x <= 0)
                {
                    problem = Fail(DiagnosticCodes.DomainError, ArgSpan(0), DiagnosticMessages.DomainError(name, DiagnosticMessages.LogarithmOfNonPositive));
                    return Value.Unknown;
                }
                return Value.Of(new Quantity(name == "exp" ? Math.Exp(x) : name == "ln" ? Math.Log(x) : Math.Log10(x), Dimension.None));
            }
            case "round" or "floor" or "ceil":
            {
                if (!Scalar(args, 0, ArgSpan(0), out var x, ref problem) || !Scalar(args, 1, ArgSpan(1), out var step, ref problem)) return Value.Unknown;
                if (!x.Dimension.SiEquals(step.Dimension))
                {
                    problem = Fail(DiagnosticCodes.DimensionMismatch, span, DiagnosticMessages.DimensionMismatch("round", Describe(x), x.Dimension, "a step of " + Describe(step), step.Dimension));
                    return Value.Unknown;
                }
                if (step.Si <= 0)
                {
                    problem = Fail(DiagnosticCodes.DomainError, ArgSpan(1), DiagnosticMessages.DomainError(name, DiagnosticMessages.StepNotPositive));
                    return Value.Unknown;
                }
                double steps = x.Si / step.Si;
                double result = name == "round" ? RoundToStep(x.Si, step.Si)
                    : (name == "floor" ? Math.Floor(steps + 1e-12) : Math.Ceiling(steps - 1e-12)) * step.Si;
                return Value.Of(x with { Si = result });
            }
            case "sum" or "mean" or "rms" or "count":
            {
                if (!ListArg(args, 0, ArgSpan(0), name, out var list, ref problem)) return Value.Unknown;
                var v = list.Values;
                if (name == "count") return Value.Of(new Quantity(v.Length, Dimension.None));
                if (v.Length == 0 && name != "sum")
                {
                    problem = Fail(DiagnosticCodes.DomainError, ArgSpan(0), DiagnosticMessages.DomainError(name, DiagnosticMessages.EmptyList));
                    return Value.Unknown;
                }
                double r = name switch
                {
                    "sum" => v.Sum(),
                    "mean" => v.Average(),
                    _ => Math.Sqrt(v.Sum(x => x * x) / v.Length),
                };
                return Value.Of(new Quantity(r, list.Dimension, list.Tag));
            }
            case "power_mean":
            {
                if (!ListArg(args, 0, ArgSpan(0), name, out var list, ref problem) || !Plain(args, 1, ArgSpan(1), name, out double p, ref problem)) return Value.Unknown;
                if (list.Values.Length == 0 || p == 0)
                {
                    problem = Fail(DiagnosticCodes.DomainError, span, DiagnosticMessages.DomainError(name, DiagnosticMessages.PowerMeanArguments));
                    return Value.Unknown;
                }
                double r = Math.Pow(list.Values.Sum(x => Math.Pow(x, p)) / list.Values.Length, 1 / p);
                return Value.Of(new Quantity(r, list.Dimension, list.Tag));
            }
        }
        if (name == "interpolate") return Interpolate(args, call, ref problem);
        problem = Fail(DiagnosticCodes.UnknownFunction, span, DiagnosticMessages.UnknownFunction(name, null));
        return Value.Unknown;
    }

    /// <summary>Rounds to a multiple of <paramref name="step"/>, half away from zero, on the decimal value.</summary>
    public static double RoundToStep(double x, double step)
    {
        double n = x / step;
        if (Math.Abs(n) < 1e15)
        {
            decimal d = Math.Round((decimal)n, 0, MidpointRounding.AwayFromZero);
            return (double)d * step;
        }
        return x;
    }

    /// <summary>Linear interpolation in a table of points; the points must be ascending and x within them.</summary>
    private static Value Interpolate(Value[] args, CallSyntax call, ref (string, TextSpan, string)? problem)
    {
        TextSpan At(int i) => call.Arguments[i].Value.Span;
        if (!Scalar(args, 0, At(0), out var x, ref problem)) return Value.Unknown;
        if (!ListArg(args, 1, At(1), "interpolate", out var xs, ref problem) || !ListArg(args, 2, At(2), "interpolate", out var ys, ref problem)) return Value.Unknown;
        if (xs.Values.Length != ys.Values.Length || xs.Values.Length < 2)
        {
            problem = (DiagnosticCodes.ListMismatch, call.Span, DiagnosticMessages.InterpolationPoints(xs.Values.Length, ys.Values.Length));
            return Value.Unknown;
        }
        if (!x.Dimension.SiEquals(xs.Dimension))
        {
            problem = (DiagnosticCodes.DimensionMismatch, At(0), DiagnosticMessages.DimensionMismatch("look up", Describe(x), x.Dimension, "points in " + Describe(new Quantity(xs.Values[0], xs.Dimension)), xs.Dimension));
            return Value.Unknown;
        }
        var p = xs.Values;
        for (int i = 1; i < p.Length; i++)
        {
            if (!(p[i] > p[i - 1]))
            {
                problem = (DiagnosticCodes.DomainError, At(1), DiagnosticMessages.DomainError("interpolate", DiagnosticMessages.PointsNotAscending));
                return Value.Unknown;
            }
        }
        if (x.Si < p[0] || x.Si > p[^1])
        {
            problem = (DiagnosticCodes.DomainError, At(0), DiagnosticMessages.DomainError("interpolate", DiagnosticMessages.OutsideCurve));
            return Value.Unknown;
        }
        int k = 1;
        while (k < p.Length - 1 && x.Si > p[k]) k++;
        double t = (x.Si - p[k - 1]) / (p[k] - p[k - 1]);
        double y = ys.Values[k - 1] + t * (ys.Values[k] - ys.Values[k - 1]);
        return Value.Of(new Quantity(y, ys.Dimension, ys.Tag));
    }

    private static Value Extreme(string name, Value[] args, CallSyntax call, ref (string, TextSpan, string)? problem)
    {
        var values = new List<double>();
        Dimension dim = default;
        Kind? tag = null;
        for (int i = 0; i < args.Length; i++)
        {
            var a = args[i];
            Dimension d;
            IEnumerable<double> xs;
            if (a.Kind == ValueKind.List) { d = a.List!.Dimension; xs = a.List.Values; tag ??= a.List.Tag; }
            else if (a.Kind == ValueKind.Quantity) { d = a.Quantity.Dimension; xs = [a.Quantity.Si]; tag ??= a.Quantity.Tag; }
            else
            {
                problem = (DiagnosticCodes.TypeMismatch, call.Arguments[i].Value.Span, DiagnosticMessages.TypeMismatch("a quantity", a.Describe()));
                return Value.Unknown;
            }
            if (i == 0)
            {
                dim = d;
            }
            else if (!d.SiEquals(dim))
            {
                problem = (DiagnosticCodes.DimensionMismatch, call.Arguments[i].Value.Span,
                    DiagnosticMessages.DimensionMismatch("compare", Operand(args[0]), dim, Operand(a), d));
                return Value.Unknown;
            }
            values.AddRange(xs);
        }
        if (values.Count == 0)
        {
            problem = (DiagnosticCodes.DomainError, call.Span, DiagnosticMessages.DomainError(name, DiagnosticMessages.EmptyList));
            return Value.Unknown;
        }
        return Value.Of(new Quantity(name == "min" ? values.Min() : values.Max(), dim, tag));
    }

    private static bool Scalar(Value[] args, int i, TextSpan span, out Quantity q, ref (string, TextSpan, string)? problem)
    {
        q = default;
        if (args[i].Kind != ValueKind.Quantity)
        {
            problem = (DiagnosticCodes.TypeMismatch, span, DiagnosticMessages.TypeMismatch("a quantity", args[i].Describe()));
            return false;
        }
        q = args[i].Quantity;
        return true;
    }

    private static bool Plain(Value[] args, int i, TextSpan span, string name, out double x, ref (string, TextSpan, string)? problem)
    {
        x = 0;
        if (!Scalar(args, i, span, out var q, ref problem)) return false;
        if (!q.Dimension.IsNone && !(q.Dimension.IsDimensionless && q.Dimension[Dimension.Angle] == 0 && q.Dimension[Dimension.Rev] == 0))
        {
            problem = (DiagnosticCodes.ArgumentNotDimensionless, span, DiagnosticMessages.ArgumentNotDimensionless(name, Describe(q)));
            return false;
        }
        x = q.Si;
        return true;
    }

    private static bool ListArg(Value[] args, int i, TextSpan span, string name, out QuantityList list, ref (string, TextSpan, string)? problem)
    {
        list = null!;
        if (args[i].Kind == ValueKind.Quantity) { list = new QuantityList([args[i].Quantity.Si], args[i].Quantity.Dimension, args[i].Quantity.Tag); return true; }
        if (args[i].Kind != ValueKind.List)
        {
            problem = (DiagnosticCodes.TypeMismatch, span, DiagnosticMessages.TypeMismatch($"a list for {name}", args[i].Describe()));
            return false;
        }
        list = args[i].List!;
        return true;
    }

    /// <summary>An argument as a message names it: "a value in mm", "a list in kN", "a plain number".</summary>
    private static string Operand(Value v)
    {
        bool list = v.Kind == ValueKind.List;
        var q = list ? new Quantity(v.List!.Values.FirstOrDefault(), v.List.Dimension, v.List.Tag) : v.Quantity;
        string? unit = Display.DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, Display.UnitSystem.Metric)?.Text;
        return unit is null ? (list ? "a list of plain numbers" : "a plain number") : $"{(list ? "a list" : "a value")} in {unit}";
    }

    private static string Describe(Quantity q) =>
        Display.DisplayUnits.Choose(q.Si, q.Dimension, q.Tag, Display.UnitSystem.Metric)?.Text is { } u ? $"a value in {u} ({Kinds.Describe(q.Dimension, q.Tag)})" : "a plain number";
}
