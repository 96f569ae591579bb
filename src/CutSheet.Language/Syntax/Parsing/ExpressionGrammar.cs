using CutSheet.Language.Syntax.Nodes;
using Superpower;
using Superpower.Model;
using Superpower.Parsers;
using static CutSheet.Language.Syntax.Parsing.TokenSpans;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// The small token parsers the statement grammar shares, and <see cref="Expression"/>: the
/// hand-written <see cref="ExpressionParser"/> presented as a Superpower parser, so statements
/// compose it like any other combinator.
/// </summary>
internal static class ExpressionGrammar
{
    public static readonly TokenListParser<TokenKind, UnitSyntax> Unit =
        TokenParsers.Of(TokenKind.Unit).Select(t => new UnitSyntax(t.ToStringValue(), Of(t)));

    public static readonly TokenListParser<TokenKind, TextValueSyntax> Text =
        TokenParsers.Of(TokenKind.String).Select(t => new TextValueSyntax(StringText.Value(t.ToStringValue()), Of(t)));

    /// <summary>Optional quoted text (null when absent).</summary>
    public static readonly TokenListParser<TokenKind, TextValueSyntax?> OptionalText =
        Text.Select(t => (TextValueSyntax?)t).OptionalOrDefault();

    /// <summary>A full expression, with an optional trailing <c>as UNIT</c>.</summary>
    public static readonly TokenListParser<TokenKind, ExpressionSyntax> Expression = ParseExpression;

    private static readonly TokenListParser<TokenKind, ExpressionSyntax?>[] AfterCache = new TokenListParser<TokenKind, ExpressionSyntax?>[(int)TokenKind.KindKeyword + 1];

    /// <summary>An optional expression after a keyword (null when absent), e.g. a parameter's default; built once per keyword.</summary>
    public static TokenListParser<TokenKind, ExpressionSyntax?> After(TokenKind keyword) =>
        AfterCache[(int)keyword] ??= TokenParsers.Of(keyword).IgnoreThen(Expression).Select(e => (ExpressionSyntax?)e).OptionalOrDefault();

    /// <summary>
    /// Superpower's tokens carry no flags, so a number's are read again from its text: a comma
    /// inside a number token can only be a decimal comma, and a slash only a fraction. Without
    /// them a clause or function body would read <c>1,5</c> as 1.5 where a definition reports it.
    /// </summary>
    private static TokenFlags NumberFlags(ReadOnlySpan<char> text) =>
        text.Contains(',') ? TokenFlags.DecimalComma : text.Contains('/') ? TokenFlags.Fraction : TokenFlags.None;

    private static TokenListParserResult<TokenKind, ExpressionSyntax> ParseExpression(TokenList<TokenKind> input)
    {
        var tokens = new List<SyntaxToken>();
        string? source = null;
        foreach (var t in input)
        {
            source ??= t.Span.Source;
            var flags = t.Kind == TokenKind.Number ? NumberFlags(t.Span.Source.AsSpan(t.Span.Position.Absolute, t.Span.Length)) : TokenFlags.None;
            tokens.Add(new SyntaxToken(t.Kind, t.Span.Position.Absolute, t.Span.Length, flags));
        }
        var result = ExpressionParser.Parse(System.Runtime.InteropServices.CollectionsMarshal.AsSpan(tokens), source ?? "", 0, new StringPool());
        int consumed = result.Expression is null ? result.ErrorIndex : result.Next;
        var remainder = input;
        for (int i = 0; i < consumed && !remainder.IsAtEnd; i++) remainder = remainder.ConsumeToken().Remainder;
        return result.Expression is null
            ? TokenListParserResult.Empty<TokenKind, ExpressionSyntax>(remainder, [result.Expected])
            : TokenListParserResult.Value(result.Expression, input, remainder);
    }
}
