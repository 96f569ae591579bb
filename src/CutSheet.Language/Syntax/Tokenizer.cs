using System.Globalization;
using System.Runtime.CompilerServices;

namespace CutSheet.Language.Syntax;

/// <summary>
/// Turns sheet text into tokens, trivia included; never fails: a character that belongs to
/// no token becomes an <see cref="TokenKind.Error"/> token. The lexing rules that matter for
/// correctness (docs/language.md, "Lexing"): a unit is read only right after a number or after
/// <c>as</c>, and a space ends it; an integer fraction or mixed number before a unit is one
/// number; <c>"</c> and <c>'</c> right after a number are inch and foot marks; a decimal comma
/// is noticed; confusable characters from PDFs are read as what they look like.
/// </summary>
public static class Tokenizer
{
    /// <summary>Every token of the text, whitespace included, so that they concatenate back to it.</summary>
    public static SyntaxToken[] Tokenize(string text)
    {
        var tokens = Scan(text, keepWhitespace: true);
        var result = tokens.ToArray();
        tokens.Release();
        return result;
    }

    /// <summary>
    /// The tokens of the text in a pooled buffer that the caller releases; without whitespace when
    /// <paramref name="keepWhitespace"/> is false. Whitespace is half of all tokens and the parser never needs it.
    /// </summary>
    internal static TokenBuffer Scan(string text, bool keepWhitespace)
    {
        // Sheets average one token per 2.3 characters with whitespace and one per 4.6 without; the
        // buffer is pooled, so a generous first guess costs nothing.
        var tokens = new TokenBuffer(keepWhitespace ? text.Length / 2 + 16 : text.Length / 4 + 16);
        int pos = 0, depth = 0;
        bool lineStart = true;
        TokenKind lastSignificant = TokenKind.Newline;
        int lastSignificantEnd = -1;

        void Add(TokenKind kind, int start, int end, TokenFlags flags = TokenFlags.None)
        {
            if (kind == TokenKind.Whitespace)
            {
                if (keepWhitespace) tokens.Add(new SyntaxToken(kind, start, end - start, flags));
                return;
            }
            tokens.Add(new SyntaxToken(kind, start, end - start, flags));
            if (kind is not (TokenKind.Comment or TokenKind.TriviaNewline))
            {
                lastSignificant = kind;
                lastSignificantEnd = end;
            }
        }

        while (pos < text.Length)
        {
            char c = text[pos];
            int start = pos;

            if (c == '\r' || c == '\n')
            {
                pos += c == '\r' && pos + 1 < text.Length && text[pos + 1] == '\n' ? 2 : 1;
                // Inside brackets a statement continues on indented (or blank) lines; a line that
                // starts at the margin is a new statement, so one unclosed bracket cannot swallow the sheet.
                if (depth > 0 && pos < text.Length && !IsSpace(text[pos]) && text[pos] != '\n' && text[pos] != '\r') depth = 0;
                Add(depth > 0 ? TokenKind.TriviaNewline : TokenKind.Newline, start, pos);
                lineStart = true;
                continue;
            }

            if (IsSpace(c))
            {
                while (pos < text.Length && IsSpace(text[pos])) pos++;
                Add(TokenKind.Whitespace, start, pos, lineStart ? TokenFlags.Indented : TokenFlags.None);
                continue;
            }

            bool wasLineStart = lineStart;
            lineStart = false;

            if (c == '#' && wasLineStart && depth == 0)
            {
                while (pos < text.Length && text[pos] != '\n' && text[pos] != '\r') pos++;
                Add(TokenKind.Heading, start, pos);
                continue;
            }

            if (c == '/' && pos + 1 < text.Length && text[pos + 1] == '/')
            {
                while (pos < text.Length && text[pos] != '\n' && text[pos] != '\r') pos++;
                Add(TokenKind.Comment, start, pos);
                continue;
            }

            bool adjacentToNumber = lastSignificant == TokenKind.Number && lastSignificantEnd == pos;

            if ((c == '"' || c == '\'' || c == '″' || c == '′') && adjacentToNumber)
            {
                pos++;
                Add(TokenKind.Unit, start, pos);
                continue;
            }

            if (c == '"' || c == '“' || c == '”')
            {
                pos++;
                var flags = TokenFlags.Unterminated;
                while (pos < text.Length && text[pos] != '\n' && text[pos] != '\r')
                {
                    if (text[pos] == '\\' && pos + 1 < text.Length && (text[pos + 1] == '"' || text[pos + 1] == '\\')) { pos += 2; continue; }
                    if (text[pos] == '"' || text[pos] == '”' || text[pos] == '“') { pos++; flags = TokenFlags.None; break; }
                    pos++;
                }
                Add(TokenKind.String, start, pos, flags);
                continue;
            }

            if (char.IsAsciiDigit(c) || (c == '.' && pos + 1 < text.Length && char.IsAsciiDigit(text[pos + 1])))
            {
                var flags = ReadNumber(text, ref pos, depth);
                Add(TokenKind.Number, start, pos, flags);
                AddUnit(text, ref pos, afterAs: false);
                continue;
            }

            if (IsIdentifierStart(c))
            {
                pos++;
                while (pos < text.Length && IsIdentifierPart(text[pos])) pos++;
                while (pos < text.Length && (text[pos] == '\'' || text[pos] == '′')) pos++;
                var word = text.AsSpan(start, pos - start);
                if (word is "x" && (lastSignificant is TokenKind.Number or TokenKind.Unit) && NextNonSpaceIsDigit(text, pos))
                {
                    Add(TokenKind.Star, start, pos);
                    continue;
                }
                if (Keywords.TryGet(word, out var keyword))
                {
                    Add(keyword, start, pos);
                    if (keyword == TokenKind.As) AddUnit(text, ref pos, afterAs: true);
                    continue;
                }
                Add(TokenKind.Identifier, start, pos);
                continue;
            }

            // Superscripts are all outside ASCII; the test keeps the string search off operators.
            if (c >= 128 && Units.Superscript.IsSuperscriptChar(c))
            {
                pos++;
                while (pos < text.Length && Units.Superscript.DigitValue(text[pos]) >= 0) pos++;
                Add(TokenKind.SuperscriptPower, start, pos);
                continue;
            }

            pos++;
            TokenKind kind;
            switch (c)
            {
                case '+': kind = TokenKind.Plus; break;
                case '-' or '−' or '–': kind = TokenKind.Minus; break;
                case '*' or '·' or '×' or '⋅' or '∙': kind = TokenKind.Star; break;
                case '/': kind = TokenKind.Slash; break;
                case '^': kind = TokenKind.Caret; break;
                case '(': kind = TokenKind.LParen; depth++; break;
                case ')': kind = TokenKind.RParen; depth = Math.Max(0, depth - 1); break;
                case '[': kind = TokenKind.LBracket; depth++; break;
                case ']': kind = TokenKind.RBracket; depth = Math.Max(0, depth - 1); break;
                case ',': kind = TokenKind.Comma; break;
                case ':': kind = TokenKind.Colon; break;
                case '.': kind = TokenKind.Dot; break;
                case '|': kind = TokenKind.Bar; break;
                case '±': kind = TokenKind.PlusMinus; break;
                case '≤': kind = TokenKind.LessEqual; break;
                case '≥': kind = TokenKind.GreaterEqual; break;
                case '≠': kind = TokenKind.NotEqual; break;
                case '=':
                    if (pos < text.Length && text[pos] == '=') { pos++; kind = TokenKind.EqualEqual; }
                    else kind = TokenKind.Equals;
                    break;
                case '!':
                    if (pos < text.Length && text[pos] == '=') { pos++; kind = TokenKind.NotEqual; }
                    else kind = TokenKind.Error;
                    break;
                case '<':
                    if (pos < text.Length && text[pos] == '=') { pos++; kind = TokenKind.LessEqual; }
                    else kind = TokenKind.Less;
                    break;
                case '>':
                    if (pos < text.Length && text[pos] == '=') { pos++; kind = TokenKind.GreaterEqual; }
                    else kind = TokenKind.Greater;
                    break;
                default:
                    if (char.IsHighSurrogate(c) && pos < text.Length && char.IsLowSurrogate(text[pos])) pos++;
                    kind = TokenKind.Error;
                    break;
            }
            Add(kind, start, pos);
        }
        return tokens;

        void AddUnit(string text, ref int pos, bool afterAs)
        {
            if (!TryReadUnit(text, pos, afterAs, out int unitStart, out int unitEnd)) return;
            if (unitStart > pos) Add(TokenKind.Whitespace, pos, unitStart);
            Add(TokenKind.Unit, unitStart, unitEnd, afterAs ? TokenFlags.AfterAs : TokenFlags.None);
            pos = unitEnd;
        }
    }

    private static TokenFlags ReadNumber(string text, ref int pos, int depth)
    {
        int start = pos;
        while (pos < text.Length && char.IsAsciiDigit(text[pos])) pos++;
        bool integer = true;
        if (pos < text.Length && text[pos] == '.' && pos + 1 < text.Length && char.IsAsciiDigit(text[pos + 1]))
        {
            integer = false;
            pos++;
            while (pos < text.Length && char.IsAsciiDigit(text[pos])) pos++;
        }
        else if (pos < text.Length && text[pos] == '.' && (pos + 1 >= text.Length || !IsIdentifierStart(text[pos + 1])))
        {
            // "2." is the number 2; "a.b" member access never starts with a digit.
            integer = false;
            pos++;
        }
        if (pos < text.Length && (text[pos] == 'e' || text[pos] == 'E'))
        {
            int p = pos + 1;
            if (p < text.Length && (text[p] == '+' || text[p] == '-')) p++;
            if (p < text.Length && char.IsAsciiDigit(text[p]))
            {
                integer = false;
                while (p < text.Length && char.IsAsciiDigit(text[p])) p++;
                pos = p;
            }
        }
        if (!integer || pos - start > 12) return TokenFlags.None;

        // 1,5 mm — a decimal comma, when a unit follows or the comma is not inside brackets.
        if (pos + 1 < text.Length && text[pos] == ',' && char.IsAsciiDigit(text[pos + 1]))
        {
            int p = pos + 1;
            while (p < text.Length && char.IsAsciiDigit(text[p])) p++;
            if (depth == 0 || UnitStartsAt(text, p))
            {
                pos = p;
                return TokenFlags.DecimalComma;
            }
        }

        // 3/8 in — an integer fraction before a unit is one number.
        if (pos + 1 < text.Length && text[pos] == '/' && char.IsAsciiDigit(text[pos + 1]))
        {
            int p = pos + 1;
            while (p < text.Length && char.IsAsciiDigit(text[p])) p++;
            if (UnitStartsAt(text, p) && (p >= text.Length || text[p] != '.'))
            {
                pos = p;
                return TokenFlags.Fraction;
            }
        }

        // 1 1/4 in — a mixed number before a unit.
        int q = pos;
        while (q < text.Length && IsSpace(text[q])) q++;
        if (q > pos && q < text.Length && char.IsAsciiDigit(text[q]))
        {
            int w = q;
            while (w < text.Length && char.IsAsciiDigit(text[w])) w++;
            if (w + 1 < text.Length && text[w] == '/' && char.IsAsciiDigit(text[w + 1]))
            {
                int d = w + 1;
                while (d < text.Length && char.IsAsciiDigit(text[d])) d++;
                if (UnitStartsAt(text, d) && (d >= text.Length || text[d] != '.'))
                {
                    pos = d;
                    return TokenFlags.Fraction;
                }
            }
        }
        return TokenFlags.None;
    }

    /// <summary>Finds the unit that follows a number or <c>as</c>: contiguous unit characters after optional spaces.</summary>
    private static bool TryReadUnit(string text, int pos, bool afterAs, out int start, out int end)
    {
        int p = pos;
        while (p < text.Length && IsSpace(text[p])) p++;
        start = end = p;
        // A reciprocal unit, 1/m or 1/min: after 'as', and after a number when a unit follows the slash
        // (the display writes 14.76 1/m; 2 1/4 in is a mixed number, read with the number before this).
        bool reciprocal = p + 1 < text.Length && text[p] == '1' && text[p + 1] == '/'
            && (afterAs || (p + 2 < text.Length && !IsSpace(text[p + 2]) && (text[p + 2] == '(' || UnitStartsAt(text, p + 2))));
        if (!(UnitStartsAt(text, pos) || reciprocal || (afterAs && p < text.Length && text[p] == '('))) return false;
        int parens = 0;
        while (p < text.Length)
        {
            char c = text[p];
            if (c == '(') { parens++; p++; continue; }
            if (c == ')') { if (parens == 0) break; parens--; p++; continue; }
            if (c == '^')
            {
                p++;
                if (p < text.Length && (text[p] == '-' || text[p] == '+' || text[p] == '−')) p++;
                continue;
            }
            if (IsUnitChar(c)) { p++; continue; }
            break;
        }
        // A unit never ends with an operator: "5 mm/ 2" leaves the slash to the expression.
        while (p > start && text[p - 1] is '/' or '*' or '·' or '⋅' or '∙' or '^' or '-' or '−' or '+' && parens == 0) p--;
        end = p;
        return p > start;
    }

    /// <summary>True when, after optional spaces, a unit begins at <paramref name="pos"/>.</summary>
    private static bool UnitStartsAt(string text, int pos)
    {
        while (pos < text.Length && IsSpace(text[pos])) pos++;
        if (pos >= text.Length) return false;
        char c = text[pos];
        if (c is '°' or 'º' or '˚' or 'µ' or 'μ' or '%' or '‰' or 'Ω') return true;
        if (!IsIdentifierStart(c)) return false;
        int end = pos + 1;
        while (end < text.Length && IsIdentifierPart(text[end])) end++;
        var word = text.AsSpan(pos, end - pos);
        if (Keywords.TryGet(word, out _)) return false;
        if (word is "x" && NextNonSpaceIsDigit(text, end)) return false;
        return true;
    }

    private static bool NextNonSpaceIsDigit(string text, int pos)
    {
        while (pos < text.Length && IsSpace(text[pos])) pos++;
        return pos < text.Length && (char.IsAsciiDigit(text[pos]) || text[pos] == '.');
    }

    private static bool IsUnitChar(char c) =>
        char.IsLetterOrDigit(c) || c is '_' or '°' or 'º' or '˚' or 'µ' or 'μ' or '%' or '‰' or 'Ω' or '·' or '⋅' or '∙' or '*' or '/'
        || (c >= 128 && Units.Superscript.IsSuperscriptChar(c));

    /// <summary>The spaces of a sheet; most characters are ASCII, so those are told apart first.</summary>
    /// <remarks>Inlined: the tokenizer asks it about nearly every character, and the call cost more than the test.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsSpace(char c) => c < 128
        ? c is ' ' or '\t' or '\f' or '\v'
        : c is '\u00A0' or '\u202F' or '\u2009' or '\u2007' or '\u2002' or '\u2003' or '\u200A' or '\uFEFF';

    /// <summary>UAX #31 identifier start: letters, letter numbers and the underscore.</summary>
    /// <remarks>The ASCII test is inlined into the tokenizer's loops; other characters take a call.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsIdentifierStart(char c) => c < 128 ? char.IsAsciiLetter(c) || c == '_' : IsNonAsciiIdentifierStart(c);

    private static bool IsNonAsciiIdentifierStart(char c)
    {
        if (c is 'µ' or 'º' or '°') return false;
        return CharUnicodeInfo.GetUnicodeCategory(c) switch
        {
            UnicodeCategory.UppercaseLetter or UnicodeCategory.LowercaseLetter or UnicodeCategory.TitlecaseLetter
                or UnicodeCategory.ModifierLetter or UnicodeCategory.OtherLetter or UnicodeCategory.LetterNumber => true,
            _ => false,
        };
    }

    /// <summary>UAX #31 identifier continue: starts plus marks, digits and connector punctuation.</summary>
    /// <remarks>The ASCII test is inlined into the tokenizer's loops; other characters take a call.</remarks>
    [MethodImpl(MethodImplOptions.AggressiveInlining)]
    public static bool IsIdentifierPart(char c) => c < 128 ? char.IsAsciiLetterOrDigit(c) || c == '_' : IsNonAsciiIdentifierPart(c);

    private static bool IsNonAsciiIdentifierPart(char c)
    {
        if (IsNonAsciiIdentifierStart(c)) return true;
        return CharUnicodeInfo.GetUnicodeCategory(c) is UnicodeCategory.NonSpacingMark or UnicodeCategory.SpacingCombiningMark
            or UnicodeCategory.DecimalDigitNumber or UnicodeCategory.ConnectorPunctuation;
    }
}
