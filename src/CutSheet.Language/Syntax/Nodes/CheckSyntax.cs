using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>check VALUE &lt;= LIMIT [within TOLERANCE]</c>: the right side is the limit.</summary>
public sealed record CheckSyntax(TextSpan Span, ExpressionSyntax Condition, ExpressionSyntax? Tolerance) : StatementSyntax(Span);
