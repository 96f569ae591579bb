using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A binary operation; <see cref="OperatorSpan"/> points at the operator for diagnostics.</summary>
public sealed record BinarySyntax(TextSpan Span, BinaryOperator Operator, ExpressionSyntax Left, ExpressionSyntax Right, TextSpan OperatorSpan)
    : ExpressionSyntax(Span);
