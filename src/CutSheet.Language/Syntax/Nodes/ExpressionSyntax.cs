using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>An expression; every node knows its span.</summary>
public abstract record ExpressionSyntax(TextSpan Span);
