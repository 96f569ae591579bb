using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>table NAME(CHOICE)</c> followed by indented <c>row</c> lines (in <see cref="StatementSyntax.Clauses"/>).</summary>
public sealed record TableSyntax(TextSpan Span, string Name, TextSpan NameSpan, string KeyChoice, TextSpan KeyChoiceSpan) : StatementSyntax(Span);
