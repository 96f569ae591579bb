using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>if CONDITION then A else B</c>; both branches are dimension-checked.</summary>
public sealed record ConditionalSyntax(TextSpan Span, ExpressionSyntax Condition, ExpressionSyntax Then, ExpressionSyntax Else) : ExpressionSyntax(Span);
