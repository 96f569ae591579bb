using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A number with an optional unit: <c>25 mm</c>, <c>3/8 in</c>, <c>0.9</c>.</summary>
public sealed record QuantityLiteralSyntax(TextSpan Span, double Number, string NumberText, TextSpan NumberSpan, UnitSyntax? Unit, bool IsFraction)
    : ExpressionSyntax(Span);
