using Superpower;
using Superpower.Model;
using Superpower.Parsers;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// One parser per token kind, built once. In query syntax every parser after the first
/// <c>from</c> is rebuilt on each parse, and building <c>Token.EqualTo</c> formats its
/// expectation by reflection; handing out cached instances keeps that off the parse path.
/// </summary>
internal static class TokenParsers
{
    private static readonly TokenListParser<TokenKind, Token<TokenKind>>[] Cache = Build();

    public static TokenListParser<TokenKind, Token<TokenKind>> Of(TokenKind kind) => Cache[(int)kind];

    private static TokenListParser<TokenKind, Token<TokenKind>>[] Build()
    {
        var kinds = Enum.GetValues<TokenKind>();
        var cache = new TokenListParser<TokenKind, Token<TokenKind>>[kinds.Max(k => (int)k) + 1];
        foreach (var k in kinds) cache[(int)k] = Token.EqualTo(k);
        return cache;
    }
}
