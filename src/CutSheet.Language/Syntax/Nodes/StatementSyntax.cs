using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A statement: one line, or one line with indented clause lines.</summary>
public abstract record StatementSyntax(TextSpan Span)
{
    /// <summary>Clauses written after the statement (<c>assumed</c>, <c>source</c>, <c>accepted</c>, …).</summary>
    public ClausesSyntax Clauses { get; init; } = ClausesSyntax.Empty;
}
