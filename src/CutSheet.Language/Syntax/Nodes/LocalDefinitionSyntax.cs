using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>where NAME = EXPRESSION</c> inside a function: a local intermediate value.</summary>
public sealed record LocalDefinitionSyntax(TextSpan Span, string Name, TextSpan NameSpan, ExpressionSyntax Value);
