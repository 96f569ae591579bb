using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary>Quoted text (a source, a message, a reason) with its span, quotes included.</summary>
public sealed record TextValueSyntax(string Value, TextSpan Span);
