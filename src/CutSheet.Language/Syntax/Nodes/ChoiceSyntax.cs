using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>choice end_fixity = fixed_fixed | fixed_free</c>: a set of named options.</summary>
public sealed record ChoiceSyntax(TextSpan Span, string Name, TextSpan NameSpan, IReadOnlyList<(string Name, TextSpan Span)> Options) : StatementSyntax(Span);
