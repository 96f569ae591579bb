using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>A reference to a name: <c>P_h</c>, or a qualified <c>s.lead_angle</c> (<see cref="Qualifier"/> set).</summary>
public sealed record NameSyntax(TextSpan Span, string Name, string? Qualifier = null, TextSpan QualifierSpan = default)
    : ExpressionSyntax(Span)
{
    public string FullName => Qualifier is null ? Name : Qualifier + "." + Name;

    /// <summary>The span of the last identifier (the name itself, without its qualifier).</summary>
    public TextSpan NameSpan => Qualifier is null ? Span : TextSpan.FromBounds(Span.End - Name.Length, Span.End);
}
