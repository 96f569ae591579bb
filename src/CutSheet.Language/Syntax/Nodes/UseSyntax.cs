using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>use NAME</c> or <c>use "path.cutsheet"</c>, with an optional alias and input overrides.</summary>
public sealed record UseSyntax(
    TextSpan Span, string Target, bool IsPath, TextSpan TargetSpan, string? Alias, TextSpan AliasSpan,
    IReadOnlyList<LocalDefinitionSyntax> Overrides) : StatementSyntax(Span);
