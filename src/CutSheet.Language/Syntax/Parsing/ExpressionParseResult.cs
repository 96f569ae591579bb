using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>The outcome of <see cref="ExpressionParser.Parse"/>: the expression, or where parsing failed and what was expected there.</summary>
internal readonly record struct ExpressionParseResult(ExpressionSyntax? Expression, int Next, int ErrorIndex, string Expected);
