using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

public sealed record BooleanLiteralSyntax(TextSpan Span, bool Value) : ExpressionSyntax(Span);
