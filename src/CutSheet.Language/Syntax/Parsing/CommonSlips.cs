using CutSheet.Language.Diagnostics;
using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// Habits from other notations, drawings and typeset text that the grammar would only call
/// "unexpected": each detector recognises one, and says what to write, with a fix where the
/// meaning is clear (docs/language.md, "Common slips"). Each returns null when its habit is not
/// the cause, and the parser's general message stands.
/// </summary>
internal static class CommonSlips
{
    /// <summary>
    /// <c>5 ft 3 in</c>: two quantities with nothing between them. Shop drawings write feet and
    /// inches this way, so when both units measure the same thing the fix adds them.
    /// </summary>
    public static Diagnostic SideBySide(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index)
    {
        var number = tokens[index];
        var end = index + 1 < tokens.Length && tokens[index + 1].Kind == TokenKind.Unit ? tokens[index + 1] : number;
        string first = source.Slice(TextSpan.FromBounds(tokens[index - 2].Start, tokens[index - 1].End));
        string second = source.Slice(TextSpan.FromBounds(number.Start, end.End));
        var a = Units.UnitCatalog.Default.Resolve(source.Slice(tokens[index - 1].Span)).Unit;
        var b = end.Kind == TokenKind.Unit ? Units.UnitCatalog.Default.Resolve(source.Slice(end.Span)).Unit : null;
        bool same = a is not null && b is not null && a.Dimension.SiEquals(b.Dimension);
        var fix = same ? new Fix(DiagnosticMessages.SideBySideFix(first, second), [new TextEdit(new TextSpan(number.Start, 0), "+ ")]) : null;
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, TextSpan.FromBounds(number.Start, end.End), DiagnosticMessages.SideBySide(first, second, same), fix);
    }

    /// <summary>
    /// <c>1 500</c> or <c>1 000 000</c>: digits grouped with spaces, as SI typesetting and many
    /// datasheets write them. A space never joins numbers here, so say so and offer the joined number.
    /// Null when the tokens are not a number followed by groups of three digits.
    /// </summary>
    public static Diagnostic? SpacedDigits(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index)
    {
        var first = tokens[index - 1];
        if (first.Kind != TokenKind.Number || !IsGroup(source, first, leading: true)) return null;
        int last = index;
        while (last < tokens.Length && tokens[last].Kind == TokenKind.Number && IsGroup(source, tokens[last], leading: false)
            && IsBlank(source.Text.AsSpan(tokens[last - 1].End, tokens[last].Start - tokens[last - 1].End)))
            last++;
        if (last == index) return null;
        var span = TextSpan.FromBounds(first.Start, tokens[last - 1].End);
        string written = source.Slice(span);
        string joined = string.Concat(written.Where(char.IsAsciiDigit));
        var edits = new List<TextEdit>();
        for (int k = index; k < last; k++) edits.Add(new TextEdit(TextSpan.FromBounds(tokens[k - 1].End, tokens[k].Start), ""));
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, TextSpan.FromBounds(tokens[index].Start, tokens[last - 1].End),
            DiagnosticMessages.SpacedDigits(written, joined), new Fix(DiagnosticMessages.SpacedDigitsFix(joined), edits));

        static bool IsBlank(ReadOnlySpan<char> gap)
        {
            foreach (char c in gap) if (!(char.IsWhiteSpace(c) || c is '\u202F' or '\u00A0' or '\u2009')) return false;
            return gap.Length > 0;
        }

        // The leading group is one to three digits, each following group exactly three.
        static bool IsGroup(SourceText source, SyntaxToken t, bool leading)
        {
            var text = source.Text.AsSpan(t.Start, t.Length);
            foreach (char c in text) if (!char.IsAsciiDigit(c)) return false;
            return leading ? text.Length is >= 1 and <= 3 : text.Length == 3;
        }
    }

    /// <summary><c>f(x = 2 mm)</c>: a named argument written with '=' (a definition's sign) instead of ':'.</summary>
    public static Diagnostic? NamedArgumentWithEquals(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index)
    {
        var token = tokens[index];
        if (token.Kind != TokenKind.Equals || index < 2 || tokens[index - 1].Kind != TokenKind.Identifier || tokens[index - 2].Kind is not (TokenKind.LParen or TokenKind.Comma))
            return null;
        // The fix writes "name: value", whatever spacing stood around the '='.
        var gap = index + 1 < tokens.Length ? TextSpan.FromBounds(tokens[index - 1].End, tokens[index + 1].Start) : token.Span;
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.NamedArgumentEquals(source.Slice(tokens[index - 1].Span)),
            new Fix(DiagnosticMessages.NamedArgumentFix, [new TextEdit(gap, index + 1 < tokens.Length ? ": " : ":")]));
    }

    /// <summary>
    /// <c>use screws.cutsheet</c>: a library named with the file extension, or a workspace sheet
    /// without its quotes. The fix drops the extension of a library and quotes anything else.
    /// </summary>
    public static Diagnostic? UseWithExtension(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
    {
        if (tokens.Length < 4 || tokens[0].Kind != TokenKind.Use || tokens[1].Kind != TokenKind.Identifier || tokens[2].Kind is not (TokenKind.Dot or TokenKind.Slash)) return null;
        int end = 2;
        while (end < tokens.Length && tokens[end].Kind is TokenKind.Dot or TokenKind.Identifier or TokenKind.Slash && tokens[end].Start == tokens[end - 1].End) end++;
        var span = TextSpan.FromBounds(tokens[1].Start, tokens[end - 1].End);
        string written = source.Slice(span);
        string name = source.Slice(tokens[1].Span);
        bool library = Library.LibrarySheets.Names.Contains(name) && written == name + ".cutsheet";
        string meant = library ? name : $"\"{written}\"";
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.UseWithExtension(written, meant),
            new Fix($"write use {meant}", [new TextEdit(span, meant)]));
    }

    /// <summary>Words other notations use to import, for the suggestion of <c>use</c>.</summary>
    private static readonly string[] ImportWords = ["import", "include", "load", "using"];

    /// <summary>The words that start a statement, for the suggestion when a line starts with a mistyped one.</summary>
    private static readonly string[] StatementWords = ["check", "caution", "notice", "warning", "use", "sheet", "display", "choice", "table", "kind"];

    /// <summary>
    /// A line that is no statement; when its first word is a statement's word mistyped (<c>chek</c>,
    /// <c>Check</c>), says which, with a fix.
    /// </summary>
    public static Diagnostic NotAStatement(SourceText source, ReadOnlySpan<SyntaxToken> tokens, TextSpan span)
    {
        var first = tokens[0];
        if (first.Kind == TokenKind.Identifier && tokens.Length > 1)
        {
            string word = source.Slice(first.Span);
            string? near = (ImportWords.Contains(word.ToLowerInvariant()) ? "use" : null)
                ?? StatementWords.FirstOrDefault(w => string.Equals(w, word, StringComparison.OrdinalIgnoreCase))
                ?? (word.Length >= 3 ? Evaluation.ExpressionEvaluator.Suggest(word, StatementWords) : null);
            if (near is not null)
                return Diagnostic.Error(DiagnosticCodes.NotAStatement, first.Span, DiagnosticMessages.MistypedStatementWord(word, near),
                    new Fix($"write {near}", [new TextEdit(first.Span, near)]));
        }
        return Diagnostic.Error(DiagnosticCodes.NotAStatement, span, DiagnosticMessages.NotAStatement);
    }

    /// <summary>
    /// <c>check x = 5 mm</c>, <c>check x =&lt; 5 mm</c>, <c>check x &lt; = 5 mm</c>: a comparison written the
    /// way other notations write it. Null when the check has no such operator.
    /// </summary>
    public static Diagnostic? CheckOperator(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
    {
        int depth = 0;
        for (int i = 1; i < tokens.Length; i++)
        {
            var t = tokens[i];
            if (t.Kind is TokenKind.LParen or TokenKind.LBracket) depth++;
            else if (t.Kind is TokenKind.RParen or TokenKind.RBracket) depth--;
            // Inside brackets an '=' belongs to an argument (f(x = 2 mm)), which has a message of its own.
            if (t.Kind != TokenKind.Equals || depth > 0) continue;
            var next = i + 1 < tokens.Length ? tokens[i + 1] : default;
            var previous = tokens[i - 1];
            // "< =" and "> =": the two halves of <= or >= apart.
            if (previous.Kind is TokenKind.Less or TokenKind.Greater && i > 1)
                return Mistake(TextSpan.FromBounds(previous.Start, t.End), previous.Kind == TokenKind.Less ? "<=" : ">=");
            // "=<" and "=>": the halves swapped.
            if (next.Kind is TokenKind.Less or TokenKind.Greater && next.Start == t.End)
                return Mistake(TextSpan.FromBounds(t.Start, next.End), next.Kind == TokenKind.Less ? "<=" : ">=");
            return Mistake(t.Span, "==");
        }
        return null;

        Diagnostic Mistake(TextSpan span, string meant) =>
            Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.CheckOperator(source.Slice(span), meant),
                new Fix($"write {meant}", [new TextEdit(span, meant)]));
    }

    /// <summary><c>choice mode = climb, conventional</c>: options listed with commas instead of <c>|</c>; the fix writes the bars.</summary>
    public static Diagnostic? ChoiceWithCommas(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
    {
        var commas = new List<TextEdit>();
        bool optionsOnly = tokens.Length >= 5 && tokens[2].Kind == TokenKind.Equals;
        for (int i = 3; optionsOnly && i < tokens.Length; i++)
        {
            var kind = tokens[i].Kind;
            if (kind == TokenKind.Comma) commas.Add(new TextEdit(TextSpan.FromBounds(tokens[i - 1].End, tokens[i].End), " |"));
            else if (kind is not (TokenKind.Identifier or TokenKind.Bar)) optionsOnly = false;
        }
        if (!optionsOnly || commas.Count == 0) return null;
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, commas[0].Span, DiagnosticMessages.ChoiceCommas,
            new Fix(DiagnosticMessages.ChoiceCommasFix, commas));
    }

    /// <summary>
    /// A function written without the kinds the language asks for: <c>f(x) = …</c> (a parameter
    /// without its kind) or <c>f(x: length) = …</c> (no return kind). Null for any other mistake.
    /// </summary>
    public static Diagnostic? FunctionHead(ReadOnlySpan<SyntaxToken> tokens, int at, TextSpan span)
    {
        if (tokens.Length < 3 || tokens[0].Kind != TokenKind.Identifier || tokens[1].Kind != TokenKind.LParen || at < 2) return null;
        int close = -1;
        for (int i = 2; i < tokens.Length; i++) if (tokens[i].Kind == TokenKind.RParen) { close = i; break; }
        var previous = tokens[at - 1].Kind;
        if ((close < 0 || at <= close) && tokens[at].Kind is TokenKind.RParen or TokenKind.Comma && previous == TokenKind.Identifier)
            return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.ParameterWithoutKind);
        if (at == close + 1 && tokens[at].Kind == TokenKind.Equals)
            return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.FunctionWithoutReturnKind);
        return null;
    }
}
