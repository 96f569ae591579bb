using System.Buffers;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

internal sealed partial class ExpressionEvaluator
{
    /// <summary>Relative tolerance of comparisons: absorbs floating-point noise only.</summary>
    public const double ComparisonTolerance = 1e-12;

    private Value Unary(UnarySyntax u, EvalFrame f)
    {
        var v = Evaluate(u.Operand, f);
        if (v.IsUnknown) return v;
        switch (u.Operator)
        {
            case UnaryOperator.Not:
                return v.Kind == ValueKind.Boolean ? Value.Of(!v.Boolean) : TypeError(f, u.Operand.Span, "true or false", v);
            case UnaryOperator.Negate:
                if (v.Kind == ValueKind.List) return Value.Of(v.List! with { Values = v.List!.Values.Select(x => -x).ToArray() });
                return v.Kind == ValueKind.Quantity ? Value.Of(v.Quantity with { Si = -v.Quantity.Si }) : TypeError(f, u.Operand.Span, "a quantity", v);
            default:
                return v.Kind is ValueKind.Quantity or ValueKind.List ? v : TypeError(f, u.Operand.Span, "a quantity", v);
        }
    }

    private Value TypeError(EvalFrame f, TextSpan span, string expected, Value got) =>
        Error(f, DiagnosticCodes.TypeMismatch, span, DiagnosticMessages.TypeMismatch(expected, got.Describe()));

    private Value Binary(BinarySyntax b, EvalFrame f)
    {
        switch (b.Operator)
        {
            case BinaryOperator.Multiply or BinaryOperator.Divide:
                return Product(b, f);
            case BinaryOperator.And or BinaryOperator.Or:
                return Logical(b, f);
        }
        // Additive chains are flattened so that a long sum does not recurse deeply.
        if (b.Operator is BinaryOperator.Add or BinaryOperator.Subtract && b.Left is BinarySyntax { Operator: BinaryOperator.Add or BinaryOperator.Subtract })
        {
            return Sum(b, f);
        }
        var left = Evaluate(b.Left, f);
        var right = Evaluate(b.Right, f);
        return Combine(b, b.Operator, b.Left, left, b.Right, right, f);
    }

    /// <summary>
    /// A chain of <c>+</c> and <c>-</c>, evaluated left to right. Each step reports its problems as
    /// if the operands so far were one sum: its span runs from the first operand to this one and
    /// its operator span is this operand. The chain's own nodes stand for the operands so far.
    /// </summary>
    private Value Sum(BinarySyntax root, EvalFrame f)
    {
        int count = 0;
        for (ExpressionSyntax n = root; n is BinarySyntax { Operator: BinaryOperator.Add or BinaryOperator.Subtract } bin; n = bin.Left) count++;
        var steps = ArrayPool<BinarySyntax>.Shared.Rent(count);
        try
        {
            ExpressionSyntax node = root;
            for (int i = count - 1; i >= 0; i--)
            {
                var bin = (BinarySyntax)node;
                steps[i] = bin;
                node = bin.Left;
            }
            var acc = Evaluate(node, f);
            var span = node.Span;
            for (int i = 0; i < count; i++)
            {
                var step = steps[i];
                var operand = step.Right;
                var right = Evaluate(operand, f);
                span = span.Cover(operand.Span);
                acc = acc.IsUnknown || right.IsUnknown ? Value.Unknown : AddSubtract(span, operand.Span, step.Operator, step.Left, acc, operand, right, f);
            }
            return acc;
        }
        finally
        {
            ArrayPool<BinarySyntax>.Shared.Return(steps, clearArray: true);
        }
    }

    /// <summary>
    /// A comparison whose operands the caller has already evaluated: what <see cref="Evaluate"/>
    /// of the whole comparison would give, without evaluating the operands a second time.
    /// </summary>
    internal Value CompareEvaluated(BinarySyntax comparison, Value left, Value right, EvalFrame f) =>
        Combine(comparison, comparison.Operator, comparison.Left, left, comparison.Right, right, f);

    private Value Combine(BinarySyntax b, BinaryOperator op, ExpressionSyntax ls, Value left, ExpressionSyntax rs, Value right, EvalFrame f)
    {
        if (left.IsUnknown || right.IsUnknown) return Value.Unknown;
        switch (op)
        {
            case BinaryOperator.Add or BinaryOperator.Subtract:
                return AddSubtract(b.Span, b.OperatorSpan, op, ls, left, rs, right, f);
            case BinaryOperator.Power:
                return Power(b, ls, left, rs, right, f);
            default:
                return Compare(b, op, ls, left, rs, right, f);
        }
    }

    private Value AddSubtract(TextSpan span, TextSpan operatorSpan, BinaryOperator op, ExpressionSyntax ls, Value left, ExpressionSyntax rs, Value right, EvalFrame f)
    {
        WarnOffsetScale(ls, f);
        WarnOffsetScale(rs, f);
        if (left.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, ls.Span, "a quantity", left);
        if (right.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, rs.Span, "a quantity", right);
        var (ld, lt) = DimensionOf(left);
        var (rd, rt) = DimensionOf(right);
        string verb = op == BinaryOperator.Add ? "add" : "subtract";
        if (!ld.SiEquals(rd))
        {
            return DimensionError(f, operatorSpan, DiagnosticMessages.DimensionMismatch(verb, Label(ls, Sample(left), f), ld, Label(rs, Sample(right), f), rd), ls, ld, rs, rd);
        }
        if (!CheckSoft(f, operatorSpan, ls, left, ld, rs, right, rd)) return Value.Unknown;
        if (lt is not null && rt is not null && lt != rt)
        {
            return Error(f, DiagnosticCodes.KindMismatch, operatorSpan, DiagnosticMessages.KindMismatch(verb, lt.Name, rt.Name));
        }
        var tag = lt ?? rt;
        if (left.Kind == ValueKind.Quantity && right.Kind == ValueKind.Quantity)
        {
            double v = op == BinaryOperator.Add ? left.Quantity.Si + right.Quantity.Si : left.Quantity.Si - right.Quantity.Si;
            return Finite(f, span, v) ? Value.Of(new Quantity(v, ld, tag)) : Value.Unknown;
        }
        return Elementwise(f, span, left, right, op == BinaryOperator.Add ? static (x, y) => x + y : static (x, y) => x - y, ld, tag);
    }

    /// <summary>Soft factors must agree: revolutions against radians is an error (2π apart); other counts only warn.</summary>
    private bool CheckSoft(EvalFrame f, TextSpan at, ExpressionSyntax ls, Value left, Dimension ld, ExpressionSyntax rs, Value right, Dimension rd)
    {
        if (ld == rd) return true;
        if (ld[Dimension.Angle] != rd[Dimension.Angle] && ld[Dimension.Rev] != rd[Dimension.Rev] && ld.RotationOrder == rd.RotationOrder)
        {
            Error(f, DiagnosticCodes.RotationKindMix, at, DiagnosticMessages.RotationKindMix(Label(ls, Sample(left), f), Label(rs, Sample(right), f)));
            return false;
        }
        Warn(f, DiagnosticCodes.CountMix, at, DiagnosticMessages.CountMix(Label(ls, Sample(left), f), Label(rs, Sample(right), f)));
        return true;
    }

    /// <summary>A temperature on a scale with an offset (°C, °F) is an absolute temperature here; arithmetic on it rarely means that.</summary>
    private void WarnOffsetScale(ExpressionSyntax operand, EvalFrame f)
    {
        bool offset = operand switch
        {
            QuantityLiteralSyntax { Unit: { } u } => UnitFacts.Of(u).Resolution.Unit?.HasOffset == true,
            NameSyntax { Qualifier: null } n => f.Scope.Find(n.Name) is DefinitionSymbol { DisplayUnitHasOffset: true },
            _ => false,
        };
        if (offset) Warn(f, DiagnosticCodes.OffsetArithmetic, operand.Span, DiagnosticMessages.OffsetArithmetic);
    }

    private Value Compare(BinarySyntax b, BinaryOperator op, ExpressionSyntax ls, Value left, ExpressionSyntax rs, Value right, EvalFrame f)
    {
        if (left.Kind == ValueKind.Choice || right.Kind == ValueKind.Choice)
        {
            if (op is not (BinaryOperator.Equal or BinaryOperator.NotEqual) || left.Kind != right.Kind || left.Choice!.Type != right.Choice!.Type)
                return TypeError(f, b.Span, "two options of one choice compared with == or !=", left.Kind == ValueKind.Choice ? right : left);
            bool same = left.Choice == right.Choice;
            return Value.Of(op == BinaryOperator.Equal ? same : !same);
        }
        if (left.Kind == ValueKind.Boolean && right.Kind == ValueKind.Boolean && op is BinaryOperator.Equal or BinaryOperator.NotEqual)
        {
            return Value.Of((left.Boolean == right.Boolean) == (op == BinaryOperator.Equal));
        }
        if (left.Kind != ValueKind.Quantity) return TypeError(f, ls.Span, "a quantity", left);
        if (right.Kind != ValueKind.Quantity) return TypeError(f, rs.Span, "a quantity", right);
        var l = left.Quantity;
        var r = right.Quantity;
        if (!l.Dimension.SiEquals(r.Dimension))
        {
            return DimensionError(f, b.OperatorSpan, DiagnosticMessages.ComparisonMismatch(Label(ls, l, f), l.Dimension, Label(rs, r, f), r.Dimension), ls, l.Dimension, rs, r.Dimension, DiagnosticCodes.ComparisonMismatch);
        }
        if (!CheckSoft(f, b.OperatorSpan, ls, left, l.Dimension, rs, right, r.Dimension)) return Value.Unknown;
        return Value.Of(CompareNumbers(op, l.Si, r.Si));
    }

    /// <summary>Compares with a relative tolerance of 1e-12 so that floating-point noise never decides a check.</summary>
    public static bool CompareNumbers(BinaryOperator op, double a, double b)
    {
        double tol = ComparisonTolerance * Math.Max(Math.Abs(a), Math.Abs(b));
        bool equal = Math.Abs(a - b) <= tol;
        return op switch
        {
            BinaryOperator.Equal => equal,
            BinaryOperator.NotEqual => !equal,
            BinaryOperator.Less => a < b && !equal,
            BinaryOperator.LessEqual => a <= b || equal,
            BinaryOperator.Greater => a > b && !equal,
            _ => a >= b || equal,
        };
    }

    /// <summary>A chain of <c>and</c> (or of <c>or</c>), evaluated flat so a long chain does not recurse.</summary>
    private Value Logical(BinarySyntax b, EvalFrame f)
    {
        int count = 1;
        for (ExpressionSyntax n = b; n is BinarySyntax bin && bin.Operator == b.Operator; n = bin.Left) count++;
        var operands = ArrayPool<ExpressionSyntax>.Shared.Rent(count);
        try
        {
            ExpressionSyntax node = b;
            for (int i = count - 1; i > 0; i--)
            {
                var bin = (BinarySyntax)node;
                operands[i] = bin.Right;
                node = bin.Left;
            }
            operands[0] = node;
            bool unknown = false;
            bool result = b.Operator == BinaryOperator.And;
            for (int i = 0; i < count; i++)
            {
                var operand = operands[i];
                var v = Evaluate(operand, f);
                if (v.IsUnknown) { unknown = true; continue; }
                if (v.Kind != ValueKind.Boolean) return TypeError(f, operand.Span, "true or false", v);
                result = b.Operator == BinaryOperator.And ? result && v.Boolean : result || v.Boolean;
            }
            return unknown ? Value.Unknown : Value.Of(result);
        }
        finally
        {
            ArrayPool<ExpressionSyntax>.Shared.Return(operands, clearArray: true);
        }
    }

    private Value Power(BinarySyntax b, ExpressionSyntax ls, Value left, ExpressionSyntax rs, Value right, EvalFrame f)
    {
        if (right.Kind != ValueKind.Quantity) return TypeError(f, rs.Span, "a plain number as exponent", right);
        if (!right.Quantity.Dimension.IsDimensionless)
            return Error(f, DiagnosticCodes.ExponentNotDimensionless, rs.Span, DiagnosticMessages.ExponentNotDimensionless(Label(rs, right.Quantity, f)));
        double exponent = right.Quantity.Si;
        if (left.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, ls.Span, "a quantity", left);
        var (dim, tag) = DimensionOf(left);
        Dimension result;
        if (dim.IsNone)
        {
            result = Dimension.None;
        }
        else if (Rational.TryFrom(exponent, out int pp, out int qq) && !dim.CanPow(pp, qq))
        {
            return Error(f, DiagnosticCodes.LimitExceeded, b.Span, DiagnosticMessages.LimitExceeded(DiagnosticMessages.ExponentLimit(Dimension.MaxExponent)));
        }
        else if (!Rational.TryFrom(exponent, out int p, out int q) || !dim.TryPow(p, q, out result))
        {
            return Error(f, DiagnosticCodes.NonIntegerExponent, b.Span,
                DiagnosticMessages.NonIntegerExponent(Label(ls, Sample(left), f), Display.NumberFormatter.Format(exponent, 4)));
        }
        Kind? resultTag = exponent == 1 ? tag : null;
        if (left.Kind == ValueKind.List)
        {
            var values = left.List!.Values.Select(x => Math.Pow(x, exponent)).ToArray();
            return Finite(f, b.Span, values) ? Value.Of(new QuantityList(values, result, resultTag)) : Value.Unknown;
        }
        double v = Math.Pow(left.Quantity.Si, exponent);
        if (double.IsNaN(v) && left.Quantity.Si < 0)
            return Error(f, DiagnosticCodes.DomainError, b.Span, DiagnosticMessages.DomainError("power", DiagnosticMessages.NegativeFractionalPower));
        return Finite(f, b.Span, v) ? Value.Of(new Quantity(v, result, resultTag)) : Value.Unknown;
    }

    private bool Finite(EvalFrame f, TextSpan span, double v)
    {
        if (double.IsFinite(v)) return true;
        if (!f.CheckOnly) Error(f, DiagnosticCodes.NotFinite, span, DiagnosticMessages.NotFinite);
        return false;
    }

    private bool Finite(EvalFrame f, TextSpan span, double[] values)
    {
        foreach (var v in values) if (!Finite(f, span, v)) return false;
        return true;
    }

    private static (Dimension, Kind?) DimensionOf(Value v) => v.Kind == ValueKind.List ? (v.List!.Dimension, v.List.Tag) : (v.Quantity.Dimension, v.Quantity.Tag);

    private static Quantity Sample(Value v) => v.Kind == ValueKind.List
        ? new Quantity(v.List!.Values.Length > 0 ? v.List.Values[0] : 0, v.List.Dimension, v.List.Tag)
        : v.Quantity;

    private Value Elementwise(EvalFrame f, TextSpan span, Value left, Value right, Func<double, double, double> op, Dimension dim, Kind? tag)
    {
        if (left.Kind == ValueKind.Quantity && right.Kind == ValueKind.Quantity)
        {
            double v = op(left.Quantity.Si, right.Quantity.Si);
            return Finite(f, span, v) ? Value.Of(new Quantity(v, dim, tag)) : Value.Unknown;
        }
        var a = left.Kind == ValueKind.List ? left.List!.Values : null;
        var c = right.Kind == ValueKind.List ? right.List!.Values : null;
        if (a is not null && c is not null && a.Length != c.Length)
            return Error(f, DiagnosticCodes.ListMismatch, span, DiagnosticMessages.ListMismatch(a.Length, c.Length));
        int n = a?.Length ?? c!.Length;
        var result = new double[n];
        for (int i = 0; i < n; i++) result[i] = op(a is null ? left.Quantity.Si : a[i], c is null ? right.Quantity.Si : c[i]);
        return Finite(f, span, result) ? Value.Of(new QuantityList(result, dim, tag)) : Value.Unknown;
    }

    /// <summary>Reports a dimension mismatch; where a mass in lb stands where a force belongs, points back at the lb literal with the fix lbf.</summary>
    private Value DimensionError(EvalFrame f, TextSpan at, string message, ExpressionSyntax ls, Dimension ld, ExpressionSyntax rs, Dimension rd, string code = DiagnosticCodes.DimensionMismatch)
    {
        var accel = Dimension.FromSi(1, 0, -2);
        ExpressionSyntax? massSide = (ld * accel).SiEquals(rd) ? ls : (rd * accel).SiEquals(ld) ? rs : null;
        if (massSide is not null && !f.Foreign)
        {
            var pounds = PoundLiterals.Find(massSide, f.Scope);
            if (pounds.Count > 0)
            {
                var related = pounds.Select(p => new RelatedLocation(p, DiagnosticMessages.MassLiteralHere)).ToArray();
                var fix = new Fix("write lbf (pound-force)", pounds.Select(p => new TextEdit(p, "lbf")).ToArray());
                return Error(f, code, at, message + "; " + DiagnosticMessages.MassForForce, fix, related);
            }
        }
        return Error(f, code, at, message);
    }
}
