using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>display units inch</c>, <c>display digits 5</c>.</summary>
public sealed record DisplaySyntax(TextSpan Span, string Setting, TextSpan SettingSpan, string Value, TextSpan ValueSpan) : StatementSyntax(Span);
