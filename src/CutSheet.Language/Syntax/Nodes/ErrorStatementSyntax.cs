using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A line that could not be parsed; reported once and otherwise skipped.</summary>
public sealed record ErrorStatementSyntax(TextSpan Span) : StatementSyntax(Span);
