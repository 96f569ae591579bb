using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

public sealed record UnarySyntax(TextSpan Span, UnaryOperator Operator, ExpressionSyntax Operand) : ExpressionSyntax(Span);
