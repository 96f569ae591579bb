using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>name(p: kind, …): return_kind = expression</c> with optional clause lines.</summary>
public sealed record FunctionSyntax(
    TextSpan Span, string Name, TextSpan NameSpan, IReadOnlyList<ParameterSyntax> Parameters,
    string ReturnKind, TextSpan ReturnKindSpan, ExpressionSyntax Body) : StatementSyntax(Span);
