using CutSheet.Language.Text;
using Superpower.Model;
using TextSpan = CutSheet.Language.Text.TextSpan;

namespace CutSheet.Language.Syntax.Parsing;

internal static class TokenSpans
{
    public static TextSpan Of(Token<TokenKind> token) => new(token.Span.Position.Absolute, token.Span.Length);

    public static TextSpan Between(Token<TokenKind> first, Token<TokenKind> last) =>
        TextSpan.FromBounds(first.Span.Position.Absolute, last.Span.Position.Absolute + last.Span.Length);
}
