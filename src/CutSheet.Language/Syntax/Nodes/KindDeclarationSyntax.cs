using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>
/// <c>kind NAME = BASE_KIND</c>: a kind of quantity of the base kind's dimension that travels as
/// a tag, so that two quantities of one dimension (a drive and a back-drive efficiency) are
/// not taken for each other.
/// </summary>
public sealed record KindDeclarationSyntax(TextSpan Span, string Name, TextSpan NameSpan, string Base, TextSpan BaseSpan) : StatementSyntax(Span);
