using System.Buffers;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Language.Evaluation;

internal sealed partial class ExpressionEvaluator
{
    /// <summary>
    /// A chain of <c>*</c> and <c>/</c>, evaluated flat (a long product does not recurse) and then
    /// examined as a whole for the rotation traps of ISO 80000-3: torque × rotational frequency
    /// without 2π, rotational frequency × length without π, a per-revolution quantity × an angle.
    /// </summary>
    private Value Product(BinarySyntax root, EvalFrame f)
    {
        if (root.Left is not BinarySyntax { Operator: BinaryOperator.Multiply or BinaryOperator.Divide }
            && !IsPi(root.Left) && !IsPi(root.Right))
        {
            // The common case, a * b or a / b: no list to build unless rotation needs a look.
            var l = Evaluate(root.Left, f);
            var r = Evaluate(root.Right, f);
            if (l.IsUnknown || r.IsUnknown) return Value.Unknown;
            if (!HasRotation(l) && !HasRotation(r)) return MultiplyPair(root, l, r, f);
        }
        int count = 1;
        for (ExpressionSyntax n = root; n is BinarySyntax { Operator: BinaryOperator.Multiply or BinaryOperator.Divide } bin; n = bin.Left) count++;
        // Rented, not allocated: a sheet evaluates thousands of products, and these arrays die with the call.
        var operandArray = ArrayPool<(bool Divide, ExpressionSyntax Syntax)>.Shared.Rent(count);
        var valueArray = ArrayPool<Value>.Shared.Rent(count);
        try
        {
            var operands = operandArray.AsSpan(0, count);
            var values = valueArray.AsSpan(0, count);
            ExpressionSyntax node = root;
            for (int i = count - 1; i > 0; i--)
            {
                var bin = (BinarySyntax)node;
                operands[i] = (bin.Operator == BinaryOperator.Divide, bin.Right);
                node = bin.Left;
            }
            operands[0] = (false, node);
            return Product(root, operands, values, f);
        }
        finally
        {
            ArrayPool<(bool Divide, ExpressionSyntax Syntax)>.Shared.Return(operandArray, clearArray: true);
            ArrayPool<Value>.Shared.Return(valueArray, clearArray: true);
        }
    }

    /// <summary>The general product: <paramref name="operands"/> in text order, the first never a divisor.</summary>
    private Value Product(BinarySyntax root, ReadOnlySpan<(bool Divide, ExpressionSyntax Syntax)> operands, Span<Value> values, EvalFrame f)
    {
        bool unknown = false;
        bool chainHasPi = false;
        foreach (var o in operands) chainHasPi |= IsPi(o.Syntax);
        // A π in this product covers the products nested in it: 2 * pi * (n * T) carries its 2π.
        if (chainHasPi) _piProducts++;
        try
        {
            for (int i = 0; i < operands.Length; i++)
            {
                values[i] = Evaluate(operands[i].Syntax, f);
                if (values[i].IsUnknown) unknown = true;
            }
        }
        finally
        {
            if (chainHasPi) _piProducts--;
        }
        if (unknown) return Value.Unknown;

        var acc = values[0];
        for (int i = 1; i < values.Length; i++)
        {
            acc = Multiply(root, acc, operands[i - 1].Syntax, values[i], operands[i].Syntax, operands[i].Divide, f);
            if (acc.IsUnknown) return acc;
        }
        if (!f.CheckOnly && !chainHasPi && _piProducts == 0) RotationTraps(root, operands, values, acc, f);
        return PiTurnsRevolutionsIntoRadians(operands, acc);
    }

    /// <summary>
    /// ISO 80000-3 writes ω = 2π·n: the factor 2π is what turns revolutions into radians. So in a
    /// product that multiplies by π, each π takes one revolution over into a radian (the number
    /// is already right), and 2·pi·n is an angular velocity, 2·pi·n·T a power, π·D·n an arc
    /// length per time; dividing a per-revolution quantity by π leaves a plain one. Without this, 2·pi·n would still count revolutions and show 2π too large.
    /// </summary>
    private static Value PiTurnsRevolutionsIntoRadians(ReadOnlySpan<(bool Divide, ExpressionSyntax Syntax)> operands, Value acc)
    {
        int up = 0, down = 0;
        foreach (var (divide, syntax) in operands)
        {
            var (n, d) = PiFactors(syntax);
            if (divide) { up += d; down += n; } else { up += n; down += d; }
        }
        if (up == 0 && down == 0) return acc;
        var (dim, tag) = DimensionOf(acc);
        int rev = dim[Dimension.Rev];
        Dimension moved;
        if (rev > 0 && up > 0)
        {
            int k = Math.Min(up, rev);
            moved = dim / Dimension.Of(Dimension.Rev, k) * Dimension.Of(Dimension.Angle, k);
        }
        else if (rev < 0 && down > 0)
        {
            // P_h/(2π) is a length per radian, and rad = 1: T = F·P_h/(2π) is a plain torque, not N·m/rad.
            moved = dim * Dimension.Of(Dimension.Rev, Math.Min(down, -rev));
        }
        else
        {
            return acc;
        }
        return acc.Kind == ValueKind.List ? Value.Of(acc.List! with { Dimension = moved }) : Value.Of(new Quantity(acc.Quantity.Si, moved, tag));
    }

    private Value MultiplyPair(BinarySyntax root, Value l, Value r, EvalFrame f) =>
        Multiply(root, l, root.Left, r, root.Right, root.Operator == BinaryOperator.Divide, f);

    private Value Multiply(BinarySyntax root, Value acc, ExpressionSyntax accSyntax, Value v, ExpressionSyntax vSyntax, bool divide, EvalFrame f)
    {
        WarnOffsetScale(accSyntax, f);
        WarnOffsetScale(vSyntax, f);
        if (acc.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, accSyntax.Span, "a quantity", acc);
        if (v.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, vSyntax.Span, "a quantity", v);
        var (ad, at) = DimensionOf(acc);
        var (vd, vt) = DimensionOf(v);
        if (!Dimension.CanCombine(ad, vd, divide ? -1 : 1))
            return Error(f, DiagnosticCodes.LimitExceeded, root.Span, DiagnosticMessages.LimitExceeded(DiagnosticMessages.ExponentLimit(Dimension.MaxExponent)));
        var dim = divide ? ad / vd : ad * vd;
        // A plain number keeps the other side's kind (T / eta is still a torque).
        Kind? tag = vd.IsNone ? at : ad.IsNone && !divide ? vt : null;
        if (divide && !f.CheckOnly)
        {
            bool zero = v.Kind == ValueKind.Quantity ? v.Quantity.Si == 0 : v.List!.Values.Contains(0);
            if (zero) return Error(f, DiagnosticCodes.DivisionByZero, vSyntax.Span, DiagnosticMessages.DivisionByZero);
        }
        if (acc.Kind == ValueKind.Quantity && v.Kind == ValueKind.Quantity)
        {
            double x = divide ? acc.Quantity.Si / v.Quantity.Si : acc.Quantity.Si * v.Quantity.Si;
            return Finite(f, root.Span, x) ? Value.Of(new Quantity(x, dim, tag)) : Value.Unknown;
        }
        return Elementwise(f, root.Span, acc, v, divide ? static (x, y) => x / y : static (x, y) => x * y, dim, tag);
    }

    /// <summary>The π factors of a product written in brackets, (2 * pi * eta): in its numerator and its denominator.</summary>
    private static (int Up, int Down) PiFactors(ExpressionSyntax e)
    {
        switch (e)
        {
            case NameSyntax { Qualifier: null, Name: "pi" or "π" }:
                return (1, 0);
            case BinarySyntax { Operator: BinaryOperator.Multiply } m:
            {
                var (a, b) = PiFactors(m.Left);
                var (c, d) = PiFactors(m.Right);
                return (a + c, b + d);
            }
            case BinarySyntax { Operator: BinaryOperator.Divide } q:
            {
                var (a, b) = PiFactors(q.Left);
                var (c, d) = PiFactors(q.Right);
                return (a + d, b + c);
            }
            default:
                return (0, 0);
        }
    }

    private static bool IsPi(ExpressionSyntax e) => e is NameSyntax { Qualifier: null, Name: "pi" or "π" };

    private static bool HasRotation(Value v)
    {
        var (d, _) = DimensionOf(v);
        return d[Dimension.Rev] != 0 || d[Dimension.Angle] != 0;
    }

    private void RotationTraps(BinarySyntax root, ReadOnlySpan<(bool Divide, ExpressionSyntax Syntax)> operands, ReadOnlySpan<Value> values, Value result, EvalFrame f)
    {
        bool anyRotation = false;
        foreach (var v in values)
        {
            var (d, _) = DimensionOf(v);
            if (d[Dimension.Rev] != 0 || d[Dimension.Angle] != 0) { anyRotation = true; break; }
        }
        if (!anyRotation) return;
        var (rd, _) = DimensionOf(result);
        bool torque = false, rotational = false, length = false, namedNumber = false;
        int perRev = -1, angle = -1;
        var torqueDim = Dimension.FromSi(2, 1, -2);
        for (int i = 0; i < operands.Length; i++)
        {
            var (d, tag) = DimensionOf(values[i]);
            if (operands[i].Divide) continue;
            if (d.SiEquals(torqueDim) && tag != Kinds.Energy) torque = true;
            if (d[Dimension.Rev] > 0 && d[Dimension.Time] < 0) rotational = true;
            if (d == Dimension.FromSi(1, 0, 0)) length = true;
            // A count of teeth or starts (or a plain number with a name) makes this a feed, f_z · z · n, not a surface speed.
            if (d.IsDimensionless && d[Dimension.Rev] == 0 && d[Dimension.Angle] == 0 && (d.HasSoft || operands[i].Syntax is NameSyntax)) namedNumber = true;
            if (d[Dimension.Rev] < 0) perRev = i;
            if (d[Dimension.Angle] > 0) angle = i;
        }
        if (rotational && rd[Dimension.Rev] > 0 && (torque || length))
        {
            var at = new TextSpan(root.Span.Start, 0);
            var twoPi = new Fix("multiply by 2 * pi", [new TextEdit(at, "2 * pi * ")]);
            if (torque)
            {
                Warn(f, DiagnosticCodes.TorqueTimesRpm, root.Span, DiagnosticMessages.TorqueTimesRpm, [twoPi]);
            }
            else if (rd.SiEquals(Dimension.FromSi(1, 0, -1)) && !namedNumber)
            {
                // v = π·D·n for a diameter, 2π·r·n for a radius: offer both, the likelier first.
                var pi = new Fix("multiply by pi (the length is a diameter)", [new TextEdit(at, "pi * ")]);
                bool halved = false;
                foreach (var o in operands) halved |= o.Divide && o.Syntax is QuantityLiteralSyntax { Number: 2, Unit: null };
                Warn(f, DiagnosticCodes.RpmTimesLength, root.Span, DiagnosticMessages.RpmTimesLength, halved ? [twoPi, pi] : [pi, twoPi]);
            }
        }
        if (perRev >= 0 && angle >= 0)
        {
            var s = operands[angle].Syntax;
            string text = f.Foreign ? "" : _source.Slice(s.Span);
            var fix = new Fix("convert the angle to revolutions", [new TextEdit(s.Span, $"({text} as rev)")]);
            Warn(f, DiagnosticCodes.PerRevTimesAngle, root.Span, DiagnosticMessages.PerRevTimesAngle, [fix]);
        }
    }

    /// <summary>
    /// <c>as UNIT</c>: the SI dimensions must agree. Between revolutions and radians (rpm ↔ rad/s,
    /// rev ↔ deg) the 2π of ISO 80000-3 is applied here and only here.
    /// </summary>
    private Value Convert(ConvertSyntax c, EvalFrame f)
    {
        var v = Evaluate(c.Operand, f);
        var resolution = UnitFacts.Of(c.Unit).Resolution;
        if (resolution.Unit is null) return UnitError(c.Unit, resolution.Error!, f, afterAs: true);
        if (v.IsUnknown) return v;
        if (v.Kind is not (ValueKind.Quantity or ValueKind.List)) return TypeError(f, c.Operand.Span, "a quantity", v);
        var unit = resolution.Unit;
        var (d, tag) = DimensionOf(v);
        if (!d.SiEquals(unit.Dimension))
        {
            string message = DiagnosticMessages.ConversionMismatch(Label(c.Operand, Sample(v), f), d, unit.Text, unit.Dimension);
            return DimensionError(f, c.Unit.Span, message, c.Operand, d, c, unit.Dimension, DiagnosticCodes.ConversionMismatch);
        }
        double factor = RotationBridge(d, unit.Dimension, c, f);
        var newTag = unit.Tag ?? (d.SiEquals(Dimension.FromSi(2, 1, -2)) ? tag : null);
        if (tag == Kinds.Torque && unit.Tag == Kinds.Energy)
        {
            Warn(f, DiagnosticCodes.TorqueAsEnergy, c.Unit.Span, DiagnosticMessages.TorqueAsEnergy, severity: Severity.Information);
        }
        if (tag is not null && unit.Tag is not null && tag != unit.Tag && !(tag == Kinds.Torque && unit.Tag == Kinds.Energy))
        {
            return Error(f, DiagnosticCodes.KindMismatch, c.Unit.Span, DiagnosticMessages.KindMismatch("convert between", tag.Name, unit.Tag.Name));
        }
        if (v.Kind == ValueKind.List)
            return Value.Of(new QuantityList(v.List!.Values.Select(x => x * factor).ToArray(), unit.Dimension, newTag));
        return Value.Of(new Quantity(v.Quantity.Si * factor, unit.Dimension, newTag));
    }

    /// <summary>The factor (2π)^k that carries k revolutions over into radians; warns when an angle appears or vanishes without it.</summary>
    private double RotationBridge(Dimension from, Dimension to, ConvertSyntax c, EvalFrame f)
    {
        int a = from[Dimension.Angle], b = from[Dimension.Rev], cc = to[Dimension.Angle], dd = to[Dimension.Rev];
        if (a == cc && b == dd) return 1;
        if (a + b == cc + dd) return Math.Pow(2 * Math.PI, b - dd);
        // rad = 1 in SI, so an angle may come and go (an arc length r·θ is a length); only between a
        // frequency and an angular velocity does that hide a factor 2π worth a warning.
        if (from.SiEquals(Dimension.FromSi(0, 0, -1)))
        {
            if (a > cc) Warn(f, DiagnosticCodes.AngleWithout2Pi, c.Unit.Span, DiagnosticMessages.AngleDropped);
            else if (a < cc) Warn(f, DiagnosticCodes.AngleWithout2Pi, c.Unit.Span, DiagnosticMessages.AngleInserted);
        }
        return 1;
    }
}
