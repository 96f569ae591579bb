using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>valid CONDITION ["why"]</c> or <c>require CONDITION ["why"]</c> on a function.</summary>
public sealed record ConditionClauseSyntax(TextSpan Span, ExpressionSyntax Condition, TextValueSyntax? Message);
