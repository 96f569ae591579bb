using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>Unit text as written after a number or after <c>as</c>.</summary>
public sealed record UnitSyntax(string Text, TextSpan Span)
{
    /// <summary>The unit's resolution and symbols, filled in by evaluation on first use (see <see cref="Evaluation.UnitFacts"/>).</summary>
    internal Evaluation.NodeCache<Evaluation.UnitFacts> Facts;
}
