using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A call argument, positional or named (<c>lead: P_h</c>).</summary>
public sealed record ArgumentSyntax(TextSpan Span, string? Name, TextSpan NameSpan, ExpressionSyntax Value);
