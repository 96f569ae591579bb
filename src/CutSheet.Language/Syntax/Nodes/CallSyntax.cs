using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

public sealed record CallSyntax(TextSpan Span, NameSyntax Callee, IReadOnlyList<ArgumentSyntax> Arguments) : ExpressionSyntax(Span);
