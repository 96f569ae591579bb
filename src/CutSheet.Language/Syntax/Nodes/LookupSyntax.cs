using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>table[key].column</c>: one cell of a data table.</summary>
public sealed record LookupSyntax(TextSpan Span, NameSyntax Table, ExpressionSyntax Key, string Column, TextSpan ColumnSpan) : ExpressionSyntax(Span);
