namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// Splits the tokens of a sheet (whitespace already left out by the tokenizer) into statements:
/// a line, plus the indented clause lines that continue it. It copies each statement's
/// significant tokens into one shared array, so that every statement is a slice of it, and hands
/// the statements out one at a time; nothing is allocated per line. A statement is handed out
/// when the next one starts, since an indented line may still extend it until then.
/// </summary>
internal ref struct StatementGroups
{
    private readonly ReadOnlySpan<SyntaxToken> _tokens;
    private readonly Span<SyntaxToken> _significant;
    private int _next;
    private int _count;
    /// <summary>Where the current line starts in the text, to tell an indented line.</summary>
    private int _lineOffset;
    private StatementGroup _pending;
    private bool _hasPending;

    /// <param name="tokens">The sheet's tokens without whitespace.</param>
    /// <param name="significant">Room for the significant tokens; at least as long as <paramref name="tokens"/>.</param>
    public StatementGroups(ReadOnlySpan<SyntaxToken> tokens, Span<SyntaxToken> significant)
    {
        _tokens = tokens;
        _significant = significant;
    }

    public bool MoveNext(out StatementGroup group)
    {
        while (_next < _tokens.Length)
        {
            int lineStart = _count;
            SyntaxToken? comment = null;
            // Whitespace is not among the tokens: a line is indented when its first token starts after the line does.
            bool indented = _tokens[_next].Start > _lineOffset;
            for (; _next < _tokens.Length && _tokens[_next].Kind != TokenKind.Newline; _next++)
            {
                var t = _tokens[_next];
                if (t.Kind == TokenKind.Comment) { if (_count > lineStart) comment = t; continue; }
                if (t.Kind == TokenKind.TriviaNewline) continue;
                _significant[_count++] = t;
            }
            if (_next < _tokens.Length) _lineOffset = _tokens[_next].End;
            _next++; // the newline
            int count = _count - lineStart;
            if (count == 0) continue;
            var first = _significant[lineStart].Kind;
            if (indented && _hasPending && Continues(_pending, first))
            {
                _pending = _pending with { Count = _pending.Count + count };
                continue;
            }
            bool isFunction = first == TokenKind.Identifier && count > 1 && _significant[lineStart + 1].Kind == TokenKind.LParen;
            var line = new StatementGroup(lineStart, count, comment, isFunction);
            if (_hasPending)
            {
                group = _pending;
                _pending = line;
                return true;
            }
            _pending = line;
            _hasPending = true;
        }
        group = _pending;
        bool any = _hasPending;
        _hasPending = false;
        return any;
    }

    /// <summary>True when an indented line that starts with <paramref name="first"/> is a clause of the statement before it.</summary>
    private readonly bool Continues(StatementGroup previous, TokenKind first) =>
        _significant[previous.Start].Kind != TokenKind.Heading && (
            first is TokenKind.Source or TokenKind.Assumed or TokenKind.Accepted or TokenKind.Valid or TokenKind.Require
                or TokenKind.Where or TokenKind.Row
            || (first is TokenKind.Caution or TokenKind.Notice or TokenKind.Warning && previous.IsFunction));
}
