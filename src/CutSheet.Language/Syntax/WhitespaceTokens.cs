namespace CutSheet.Language.Syntax;

/// <summary>
/// Puts the whitespace tokens back into a token list the tokenizer made without them. The tokenizer
/// reads every run of spaces whole, so each gap between two kept tokens (and before the first and
/// after the last) is exactly one whitespace token; it is indented when it starts a line — at the
/// start of the text or right after a line break — just as the tokenizer flags it.
/// </summary>
internal static class WhitespaceTokens
{
    public static SyntaxToken[] Restore(ReadOnlySpan<SyntaxToken> tokens, int textLength)
    {
        int gaps = 0, end = 0;
        foreach (var t in tokens)
        {
            if (t.Start > end) gaps++;
            end = t.End;
        }
        if (textLength > end) gaps++;

        var all = new SyntaxToken[tokens.Length + gaps];
        int n = 0;
        end = 0;
        bool lineStart = true;
        foreach (var t in tokens)
        {
            if (t.Start > end) all[n++] = Gap(end, t.Start, lineStart);
            all[n++] = t;
            end = t.End;
            lineStart = t.Kind is TokenKind.Newline or TokenKind.TriviaNewline;
        }
        if (textLength > end) all[n++] = Gap(end, textLength, lineStart);
        return all;
    }

    private static SyntaxToken Gap(int start, int end, bool lineStart) =>
        new(TokenKind.Whitespace, start, end - start, lineStart ? TokenFlags.Indented : TokenFlags.None);
}
