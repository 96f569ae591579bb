using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>expression as UNIT</c>: shows the value in a unit; between rotation kinds it applies the 2π bridge.</summary>
public sealed record ConvertSyntax(TextSpan Span, ExpressionSyntax Operand, UnitSyntax Unit) : ExpressionSyntax(Span);
