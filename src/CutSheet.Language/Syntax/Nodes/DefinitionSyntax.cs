using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>name = expression [as UNIT] [assumed] [source "…"] [// description]</c>.</summary>
public sealed record DefinitionSyntax(TextSpan Span, string Name, TextSpan NameSpan, ExpressionSyntax Value) : StatementSyntax(Span);
