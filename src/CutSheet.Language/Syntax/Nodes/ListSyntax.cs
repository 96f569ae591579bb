using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>[a, b, c]</c>: a list of quantities of one dimension.</summary>
public sealed record ListSyntax(TextSpan Span, IReadOnlyList<ExpressionSyntax> Items) : ExpressionSyntax(Span);
