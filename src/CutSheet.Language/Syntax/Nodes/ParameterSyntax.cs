using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>name: kind [= default]</c> in a function's parameter list.</summary>
public sealed record ParameterSyntax(TextSpan Span, string Name, TextSpan NameSpan, string KindName, TextSpan KindSpan, ExpressionSyntax? Default);
