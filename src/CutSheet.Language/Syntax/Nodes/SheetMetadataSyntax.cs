using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>sheet KEY "value"</c>: title-block metadata.</summary>
public sealed record SheetMetadataSyntax(TextSpan Span, string Key, TextSpan KeySpan, TextValueSyntax Value) : StatementSyntax(Span);
