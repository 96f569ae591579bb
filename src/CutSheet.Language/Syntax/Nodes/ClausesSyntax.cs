using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>
/// The clauses a statement may carry. Which clauses a statement allows is checked by the
/// binder, so the parser can read them uniformly.
/// </summary>
public sealed record ClausesSyntax
{
    public static readonly ClausesSyntax Empty = new();

    public TextSpan? Assumed { get; init; }
    public TextValueSyntax? Source { get; init; }
    public TextValueSyntax? Accepted { get; init; }
    public TextValueSyntax? Description { get; init; }
    public IReadOnlyList<LocalDefinitionSyntax> Locals { get; init; } = [];
    public IReadOnlyList<ConditionClauseSyntax> Valid { get; init; } = [];
    public IReadOnlyList<ConditionClauseSyntax> Require { get; init; } = [];
    public IReadOnlyList<CautionSyntax> Cautions { get; init; } = [];
    public IReadOnlyList<TableRowSyntax> Rows { get; init; } = [];

    /// <summary>Spans of every clause keyword, for "not allowed here" diagnostics.</summary>
    public IReadOnlyList<(string Keyword, TextSpan Span)> Keywords { get; init; } = [];
}
