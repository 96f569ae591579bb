using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Utilisation and margin of a check (docs/language.md, "Checks"). The right side is the limit.
/// <list type="bullet">
/// <item><c>value &lt;= limit</c>: utilisation = value/limit, margin = limit − value.</item>
/// <item><c>value &gt;= limit</c>: utilisation = limit/value, margin = value − limit.</item>
/// <item><c>value == target within tol</c>: utilisation = |value − target|/tol, margin = tol − |value − target|.</item>
/// </list>
/// Utilisation is defined only where it means "how much of the allowance is used": a positive
/// limit and a value that is not negative (positive for <c>&gt;=</c>); otherwise it is null and
/// the margin alone speaks.
/// The margin is positive on the safe side. Comparisons absorb only floating-point noise.
/// </summary>
public static class CheckSemantics
{
    public readonly record struct Outcome(bool Passed, double? Utilisation, double? Margin);

    public static Outcome Compute(BinaryOperator op, double value, double limit, double? tolerance = null)
    {
        switch (op)
        {
            case BinaryOperator.LessEqual or BinaryOperator.Less:
            {
                bool passed = ExpressionEvaluator.CompareNumbers(op, value, limit);
                double? u = limit > 0 && value >= 0 ? value / limit : null;
                return new Outcome(passed, u, limit - value);
            }
            case BinaryOperator.GreaterEqual or BinaryOperator.Greater:
            {
                bool passed = ExpressionEvaluator.CompareNumbers(op, value, limit);
                double? u = value > 0 && limit > 0 ? limit / value : null;
                return new Outcome(passed, u, value - limit);
            }
            case BinaryOperator.Equal when tolerance is double tol:
            {
                double diff = Math.Abs(value - limit);
                bool passed = ExpressionEvaluator.CompareNumbers(BinaryOperator.LessEqual, diff, Math.Abs(tol));
                double? u = tol != 0 ? diff / Math.Abs(tol) : null;
                return new Outcome(passed, u, Math.Abs(tol) - diff);
            }
            case BinaryOperator.Equal:
                return new Outcome(ExpressionEvaluator.CompareNumbers(op, value, limit), null, null);
            default:
                return new Outcome(ExpressionEvaluator.CompareNumbers(op, value, limit), null, null);
        }
    }
}
