using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Results;

/// <summary>What one statement of a sheet produced. <see cref="Line"/> is zero-based.</summary>
public abstract record StatementResult(StatementSyntax Syntax, int Line)
{
    public TextSpan Span => Syntax.Span;

    /// <summary>Cautions fired by this statement.</summary>
    public IReadOnlyList<CautionResult> Cautions { get; init; } = [];
}
