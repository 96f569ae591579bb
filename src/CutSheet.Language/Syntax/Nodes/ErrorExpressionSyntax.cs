using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>Where an expression could not be parsed; its value is unknown and dependents stay quiet.</summary>
public sealed record ErrorExpressionSyntax(TextSpan Span) : ExpressionSyntax(Span);
