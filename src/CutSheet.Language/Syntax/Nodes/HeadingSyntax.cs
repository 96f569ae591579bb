using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c># Title</c>, <c>## Section</c>.</summary>
public sealed record HeadingSyntax(TextSpan Span, int Level, string Text) : StatementSyntax(Span);
