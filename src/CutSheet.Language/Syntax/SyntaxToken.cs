using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax;

/// <summary>
/// One token of a sheet, trivia included, so that the tokens of a text concatenate back to it.
/// <see cref="Flags"/> records what the tokenizer noticed (a fraction, a decimal comma, an inch mark).
/// </summary>
public readonly record struct SyntaxToken(TokenKind Kind, int Start, int Length, TokenFlags Flags = TokenFlags.None)
{
    public int End => Start + Length;

    public TextSpan Span => new(Start, Length);

    public bool IsTrivia => Kind is TokenKind.Whitespace or TokenKind.TriviaNewline or TokenKind.Comment;
}

[Flags]
public enum TokenFlags
{
    None = 0,
    /// <summary>An integer fraction or mixed number written before a unit (<c>3/8 in</c>, <c>1 1/4 in</c>).</summary>
    Fraction = 1,
    /// <summary>A number written with a decimal comma (<c>1,5</c>).</summary>
    DecimalComma = 2,
    /// <summary>An unterminated string.</summary>
    Unterminated = 4,
    /// <summary>A unit written after <c>as</c> rather than after a number.</summary>
    AfterAs = 8,
    /// <summary>An indented line start (continuation clause).</summary>
    Indented = 16,
}
