using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using Superpower;
using Superpower.Model;
using TextSpan = CutSheet.Language.Text.TextSpan;
using Superpower.Parsers;
using static CutSheet.Language.Syntax.Parsing.TokenSpans;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// The expression grammar as Superpower token-list parsers, built bottom-up. Precedence,
/// lowest first: <c>as</c>; <c>or</c>; <c>and</c>; <c>not</c>; comparisons (not chained);
/// <c>+ -</c>; <c>* /</c>; unary minus; <c>^</c> and superscripts (right-associative, so
/// <c>-2^2</c> is −4 and <c>2^-1</c> is ½); calls, lookups and primaries.
/// </summary>
internal static class ExpressionGrammar
{
    public static readonly TokenListParser<TokenKind, UnitSyntax> Unit =
        Token.EqualTo(TokenKind.Unit).Select(t => new UnitSyntax(t.ToStringValue(), Of(t)));

    public static readonly TokenListParser<TokenKind, TextValueSyntax> Text =
        Token.EqualTo(TokenKind.String).Select(t => new TextValueSyntax(StringText.Value(t.ToStringValue()), Of(t)));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Literal =
        from n in Token.EqualTo(TokenKind.Number)
        from u in Unit.OptionalOrDefault()
        select MakeLiteral(n, u);

    public static readonly TokenListParser<TokenKind, NameSyntax> Name =
        from first in Token.EqualTo(TokenKind.Identifier)
        from member in Token.EqualTo(TokenKind.Dot).IgnoreThen(Token.EqualTo(TokenKind.Identifier)).Try().OptionalOrDefault()
        select member.HasValue
            ? new NameSyntax(Between(first, member), member.ToStringValue(), first.ToStringValue(), Of(first))
            : new NameSyntax(Of(first), first.ToStringValue());

    private static readonly TokenListParser<TokenKind, ArgumentSyntax> NamedArgument =
        from name in Token.EqualTo(TokenKind.Identifier)
        from colon in Token.EqualTo(TokenKind.Colon)
        from value in Parse.Ref(() => Expression!)
        select new ArgumentSyntax(Of(name).Cover(value.Span), name.ToStringValue(), Of(name), value);

    private static readonly TokenListParser<TokenKind, ArgumentSyntax> Argument =
        NamedArgument.Try().Or(Parse.Ref(() => Expression!).Select(e => new ArgumentSyntax(e.Span, null, default, e)));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> NameOrCallOrLookup =
        from name in Name
        from rest in CallTail(name).Or(LookupTail(name)).OptionalOrDefault()
        select rest ?? name;

    private static TokenListParser<TokenKind, ExpressionSyntax> CallTail(NameSyntax name) =>
        from open in Token.EqualTo(TokenKind.LParen)
        from args in Argument.ManyDelimitedBy(Token.EqualTo(TokenKind.Comma))
        from close in Token.EqualTo(TokenKind.RParen)
        select (ExpressionSyntax)new CallSyntax(TextSpan.FromBounds(name.Span.Start, Of(close).End), name, args);

    private static TokenListParser<TokenKind, ExpressionSyntax> LookupTail(NameSyntax name) =>
        from open in Token.EqualTo(TokenKind.LBracket)
        from key in Parse.Ref(() => Expression!)
        from close in Token.EqualTo(TokenKind.RBracket)
        from dot in Token.EqualTo(TokenKind.Dot)
        from column in Token.EqualTo(TokenKind.Identifier)
        select (ExpressionSyntax)new LookupSyntax(TextSpan.FromBounds(name.Span.Start, Of(column).End), name, key, column.ToStringValue(), Of(column));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Parenthesized =
        from open in Token.EqualTo(TokenKind.LParen)
        from inner in Parse.Ref(() => Expression!)
        from close in Token.EqualTo(TokenKind.RParen)
        select inner;

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> List =
        from open in Token.EqualTo(TokenKind.LBracket)
        from items in Parse.Ref(() => Expression!).ManyDelimitedBy(Token.EqualTo(TokenKind.Comma))
        from close in Token.EqualTo(TokenKind.RBracket)
        select (ExpressionSyntax)new ListSyntax(Between(open, close), items);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Boolean =
        Token.EqualTo(TokenKind.True).Select(t => (ExpressionSyntax)new BooleanLiteralSyntax(Of(t), true))
            .Or(Token.EqualTo(TokenKind.False).Select(t => (ExpressionSyntax)new BooleanLiteralSyntax(Of(t), false)));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Conditional =
        from ifToken in Token.EqualTo(TokenKind.If)
        from condition in Parse.Ref(() => Expression!)
        from then in Token.EqualTo(TokenKind.Then)
        from a in Parse.Ref(() => Expression!)
        from elseToken in Token.EqualTo(TokenKind.Else)
        from b in Parse.Ref(() => Expression!)
        select (ExpressionSyntax)new ConditionalSyntax(TextSpan.FromBounds(Of(ifToken).Start, b.Span.End), condition, a, b);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Primary =
        Literal.Or(NameOrCallOrLookup).Or(Parenthesized).Or(List).Or(Boolean).Or(Conditional);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Power =
        from b in Primary
        from supers in Token.EqualTo(TokenKind.SuperscriptPower).Many()
        from caret in Token.EqualTo(TokenKind.Caret).OptionalOrDefault()
        from exponent in caret.HasValue ? Parse.Ref(() => Unary!) : Parse.Return<TokenKind, ExpressionSyntax?>(null)!
        select ApplyPowers(b, supers, caret, exponent);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Unary =
        (from op in Token.EqualTo(TokenKind.Minus).Or(Token.EqualTo(TokenKind.Plus))
         from operand in Parse.Ref(() => Unary!)
         select (ExpressionSyntax)new UnarySyntax(Of(op).Cover(operand.Span),
             op.Kind == TokenKind.Minus ? UnaryOperator.Negate : UnaryOperator.Plus, operand))
        .Or(Power);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Multiplicative =
        Parse.Chain(Token.EqualTo(TokenKind.Star).Or(Token.EqualTo(TokenKind.Slash)), Unary,
            (op, l, r) => Binary(op, op.Kind == TokenKind.Star ? BinaryOperator.Multiply : BinaryOperator.Divide, l, r));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Additive =
        Parse.Chain(Token.EqualTo(TokenKind.Plus).Or(Token.EqualTo(TokenKind.Minus)), Multiplicative,
            (op, l, r) => Binary(op, op.Kind == TokenKind.Plus ? BinaryOperator.Add : BinaryOperator.Subtract, l, r));

    private static readonly TokenListParser<TokenKind, Token<TokenKind>> ComparisonOperator =
        Token.EqualTo(TokenKind.LessEqual).Or(Token.EqualTo(TokenKind.GreaterEqual)).Or(Token.EqualTo(TokenKind.Less))
            .Or(Token.EqualTo(TokenKind.Greater)).Or(Token.EqualTo(TokenKind.EqualEqual)).Or(Token.EqualTo(TokenKind.NotEqual));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Comparison =
        from left in Additive
        from rest in (from op in ComparisonOperator from right in Additive select (op, right)).OptionalOrDefault()
        select rest.right is null ? left : Binary(rest.op, ComparisonOf(rest.op.Kind), left, rest.right);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Negation =
        (from op in Token.EqualTo(TokenKind.Not)
         from operand in Parse.Ref(() => Negation!)
         select (ExpressionSyntax)new UnarySyntax(Of(op).Cover(operand.Span), UnaryOperator.Not, operand))
        .Or(Comparison);

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Conjunction =
        Parse.Chain(Token.EqualTo(TokenKind.And), Negation, (op, l, r) => Binary(op, BinaryOperator.And, l, r));

    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Disjunction =
        Parse.Chain(Token.EqualTo(TokenKind.Or), Conjunction, (op, l, r) => Binary(op, BinaryOperator.Or, l, r));

    /// <summary>A full expression, with an optional trailing <c>as UNIT</c>.</summary>
    public static readonly TokenListParser<TokenKind, ExpressionSyntax> Expression =
        from e in Disjunction
        from conversion in Token.EqualTo(TokenKind.As).IgnoreThen(Unit).OptionalOrDefault()
        select conversion is null ? e : new ConvertSyntax(e.Span.Cover(conversion.Span), e, conversion);

    private static ExpressionSyntax MakeLiteral(Token<TokenKind> number, UnitSyntax? unit)
    {
        var span = unit is null ? Of(number) : Of(number).Cover(unit.Span);
        string text = number.ToStringValue();
        // A decimal comma or an inch/foot mark is reported by the sheet parser; the value stays unknown.
        if (text.Contains(',') || unit is { Text: "\"" or "'" or "″" or "′" }) return new ErrorExpressionSyntax(span);
        bool fraction = text.Contains('/');
        return new QuantityLiteralSyntax(span, NumberText.Parse(text), text, Of(number), unit, fraction);
    }

    private static ExpressionSyntax ApplyPowers(ExpressionSyntax b, Token<TokenKind>[] supers, Token<TokenKind> caret, ExpressionSyntax? exponent)
    {
        foreach (var s in supers)
        {
            string text = s.ToStringValue();
            int sign = text.StartsWith('⁻') ? -1 : 1;
            int value = 0;
            foreach (char c in text)
            {
                int d = Units.Superscript.DigitValue(c);
                if (d >= 0) value = value * 10 + d;
            }
            var literal = new QuantityLiteralSyntax(Of(s), sign * value, text, Of(s), null, false);
            b = new BinarySyntax(b.Span.Cover(Of(s)), BinaryOperator.Power, b, literal, Of(s));
        }
        if (caret.HasValue && exponent is not null)
        {
            b = new BinarySyntax(b.Span.Cover(exponent.Span), BinaryOperator.Power, b, exponent, Of(caret));
        }
        return b;
    }

    private static ExpressionSyntax Binary(Token<TokenKind> op, BinaryOperator kind, ExpressionSyntax left, ExpressionSyntax right) =>
        new BinarySyntax(left.Span.Cover(right.Span), kind, left, right, Of(op));

    private static BinaryOperator ComparisonOf(TokenKind kind) => kind switch
    {
        TokenKind.LessEqual => BinaryOperator.LessEqual,
        TokenKind.GreaterEqual => BinaryOperator.GreaterEqual,
        TokenKind.Less => BinaryOperator.Less,
        TokenKind.Greater => BinaryOperator.Greater,
        TokenKind.EqualEqual => BinaryOperator.Equal,
        _ => BinaryOperator.NotEqual,
    };
}
