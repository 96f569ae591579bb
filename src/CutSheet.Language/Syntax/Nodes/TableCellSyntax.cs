using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>One cell: a typical value and, optionally, its range (<c>from LOW to HIGH</c>).</summary>
public sealed record TableCellSyntax(TextSpan Span, string Column, TextSpan ColumnSpan, ExpressionSyntax Value, ExpressionSyntax? Low, ExpressionSyntax? High);
