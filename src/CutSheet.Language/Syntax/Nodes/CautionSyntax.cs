using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>caution "message" when CONDITION</c> (or <c>notice</c> / <c>warning</c>).</summary>
public sealed record CautionSyntax(TextSpan Span, CautionLevel Level, TextValueSyntax Message, ExpressionSyntax Condition) : StatementSyntax(Span);
