using System.Buffers;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using Superpower;
using Superpower.Model;
using TextSpan = CutSheet.Language.Text.TextSpan;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// Splits the token stream into statements (a line, plus indented clause lines that continue
/// it) and parses each on its own, so one bad line never hides the rest. Around the
/// all-or-nothing combinator parse sits the recovery: a definition whose formula does not
/// parse still declares its name (its value is unknown and dependents stay quiet), and a
/// function whose formula does not parse still declares its signature.
/// </summary>
internal static class SheetParser
{
    private const int MaxDepth = 64;
    /// <summary>Enough for a list of 10,000 values; long chains are parsed and evaluated without deep recursion.</summary>
    private const int MaxTokensPerStatement = 25_000;

    /// <param name="keepRecords">Keep what each statement gave, so that this parse can serve a later re-parse; only editors re-parse, and the records cost a command line ~4 % of a parse.</param>
    public static SheetSyntax Parse(SourceText source, SheetSyntax? previous, bool keepRecords)
    {
        // Tokens and significant tokens are needed only while parsing (no node keeps them), so both
        // live in pooled arrays; should parsing throw, they are simply not handed back.
        var tokens = Tokenizer.Scan(source.Text, keepWhitespace: false);
        var significant = ArrayPool<SyntaxToken>.Shared.Rent(Math.Max(tokens.Count, 1));
        var diagnostics = new List<Diagnostic>();
        // A statement starts a line, so the line count bounds the statement count.
        var statements = new List<StatementSyntax>(source.LineCount);
        var pool = new StringPool(source.LineCount);
        var records = keepRecords ? new List<StatementRecord>(source.LineCount) : null;
        var reuse = previous is null ? null : new StatementReuse(previous);
        var groups = new StatementGroups(tokens.AsSpan(), significant);
        while (groups.MoveNext(out var group))
        {
            var groupTokens = significant.AsSpan(group.Start, group.Count);
            StatementSyntax? statement;
            if (records is null)
            {
                statement = ParseStatement(source, groupTokens, group.Comment, diagnostics, pool);
            }
            else
            {
                var (start, end, hash) = StatementRecord.Describe(groupTokens, group.Comment);
                int before = diagnostics.Count;
                if (reuse is not null && reuse.TryTake(source.Text, start, end, hash, out statement, out var earlier))
                    diagnostics.AddRange(earlier);
                else
                    statement = ParseStatement(source, groupTokens, group.Comment, diagnostics, pool);
                records.Add(new StatementRecord(start, end, hash, statement, before, diagnostics.Count - before));
            }
            if (statement is not null) statements.Add(statement);
        }
        ArrayPool<SyntaxToken>.Shared.Return(significant);
        tokens.Release();
        return new SheetSyntax(source, statements, diagnostics, records?.ToArray() ?? []);
    }

    private static StatementSyntax? ParseStatement(SourceText source, ReadOnlySpan<SyntaxToken> tokens, SyntaxToken? comment, List<Diagnostic> diagnostics, StringPool pool)
    {
        var first = tokens[0];
        var span = TextSpan.FromBounds(first.Start, tokens[^1].End);

        if (first.Kind == TokenKind.Heading)
        {
            var text = source.Text.AsSpan(first.Start, first.Length);
            int level = 0;
            while (level < text.Length && text[level] == '#') level++;
            if (tokens.Length > 1) diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.NotAStatement));
            return new HeadingSyntax(first.Span, level, text[level..].Trim().ToString());
        }

        bool fatal = ScanTokens(source, tokens, diagnostics);
        StatementSyntax? statement = null;
        if (!fatal && first.Kind == TokenKind.Identifier && tokens.Length > 1 && tokens[1].Kind == TokenKind.Equals)
        {
            // The description goes straight into the definition's clauses rather than into a copy of the statement.
            statement = ParseDefinition(source, tokens, diagnostics, pool, comment is { } d ? Description(source, d) : null);
            if (statement is not null) return statement;
        }
        else if (!fatal && first.Kind == TokenKind.Check && TryParseCheck(source, tokens, pool) is { } check)
        {
            statement = check;
        }
        else if (!fatal)
        {
            var second = tokens.Length > 1 ? tokens[1].Kind : TokenKind.None;
            var parser = StatementGrammar.For(first.Kind, second);
            if (parser is null)
            {
                diagnostics.Add(NotAStatement(source, tokens, span));
                return new ErrorStatementSyntax(span);
            }
            if (first.Kind == TokenKind.Check && CheckOperatorMistake(source, tokens) is { } mistake)
            {
                diagnostics.Add(mistake);
            }
            else if (first.Kind == TokenKind.Choice && ChoiceWithCommas(source, tokens) is { } commas)
            {
                diagnostics.Add(commas);
            }
            else
            {
                var result = parser(ToTokenList(source, tokens));
                if (result.HasValue) statement = result.Value;
                else diagnostics.Add(ParseError(source, tokens, result));
            }
        }
        statement ??= Recover(source, tokens, span);
        return comment is { } c ? WithDescription(statement, source, c) : statement;
    }

    /// <summary>
    /// The common statement, <c>name = expression [clauses]</c>, parsed directly (the hot path);
    /// clauses, when present, go through the statement grammar.
    /// </summary>
    private static StatementSyntax? ParseDefinition(SourceText source, ReadOnlySpan<SyntaxToken> tokens, List<Diagnostic> diagnostics, StringPool pool,
        TextValueSyntax? description)
    {
        var name = tokens[0];
        var result = ExpressionParser.Parse(tokens, source.Text, 2, pool);
        if (result.Expression is null)
        {
            diagnostics.Add(ExpressionError(source, tokens, result.ErrorIndex, result.Expected));
            return null;
        }
        var clauses = ClausesSyntax.Empty;
        if (result.Next < tokens.Length)
        {
            var rest = tokens[result.Next..];
            var parsed = StatementGrammar.ClausesToEnd(ToTokenList(source, rest));
            if (!parsed.HasValue)
            {
                int at = parsed.Location.IsAtEnd ? tokens.Length : result.Next + IndexAt(rest, parsed.Location.First().Span.Position.Absolute);
                diagnostics.Add(ExpressionError(source, tokens, at, "an operator, 'as', a clause (assumed, source, accepted) or the end of the line"));
                return null;
            }
            clauses = parsed.Value;
        }
        if (description is not null) clauses = clauses with { Description = description };
        var span = TextSpan.FromBounds(name.Start, tokens[^1].End);
        return new DefinitionSyntax(span, pool.Get(source.Text, name.Start, name.Length), name.Span, result.Expression) { Clauses = clauses };
    }

    /// <summary>
    /// <c>check condition [within tolerance] [clauses]</c> parsed directly, as the statement grammar would
    /// parse it; null when it does not parse, and then the grammar parses it again to report the error
    /// as it always has. A statement with a fraction or a decimal comma is left to the grammar too: the
    /// grammar hands expressions its tokens without their flags, so its literals differ.
    /// </summary>
    private static StatementSyntax? TryParseCheck(SourceText source, ReadOnlySpan<SyntaxToken> tokens, StringPool pool)
    {
        foreach (var t in tokens)
        {
            if ((t.Flags & (TokenFlags.Fraction | TokenFlags.DecimalComma)) != 0) return null;
        }
        var condition = ExpressionParser.Parse(tokens, source.Text, 1, pool);
        if (condition.Expression is null) return null;
        int next = condition.Next;
        ExpressionSyntax? tolerance = null;
        if (next < tokens.Length && tokens[next].Kind == TokenKind.Within)
        {
            var within = ExpressionParser.Parse(tokens, source.Text, next + 1, pool);
            if (within.Expression is null) return null;
            tolerance = within.Expression;
            next = within.Next;
        }
        var clauses = ClausesSyntax.Empty;
        if (next < tokens.Length)
        {
            var parsed = StatementGrammar.ClausesToEnd(ToTokenList(source, tokens[next..]));
            if (!parsed.HasValue) return null;
            clauses = parsed.Value;
        }
        return new CheckSyntax(tokens[0].Span.Cover(tolerance?.Span ?? condition.Expression.Span), condition.Expression, tolerance) { Clauses = clauses };
    }

    private static int IndexAt(ReadOnlySpan<SyntaxToken> tokens, int start)
    {
        for (int k = 0; k < tokens.Length; k++) if (tokens[k].Start == start) return k;
        return tokens.Length;
    }

    private static Diagnostic ExpressionError(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index, string expected)
    {
        if (index >= tokens.Length)
        {
            return Diagnostic.Error(DiagnosticCodes.IncompleteStatement, new TextSpan(tokens[^1].End, 0), DiagnosticMessages.Incomplete("expected " + expected));
        }
        var token = tokens[index];
        if (token.Kind == TokenKind.Identifier && index > 0 && tokens[index - 1].Kind is TokenKind.Identifier or TokenKind.RParen
            && Units.UnitCatalog.Default.IsSymbol(source.Slice(token.Span)))
        {
            return Diagnostic.Error(DiagnosticCodes.UnitWithoutNumber, token.Span, DiagnosticMessages.UnitWithoutNumber);
        }
        if (token.Kind == TokenKind.Number && index >= 2 && tokens[index - 1].Kind == TokenKind.Unit && tokens[index - 2].Kind == TokenKind.Number)
            return SideBySide(source, tokens, index);
        if (token.Kind == TokenKind.Number && index >= 1 && SpacedDigits(source, tokens, index) is { } spaced) return spaced;
        // f(x = 2 mm): a named argument written with '=' (a definition's sign) instead of ':'.
        if (token.Kind == TokenKind.Equals && index >= 2 && tokens[index - 1].Kind == TokenKind.Identifier && tokens[index - 2].Kind is TokenKind.LParen or TokenKind.Comma)
        {
            // The fix writes "name: value", whatever spacing stood around the '='.
            var gap = index + 1 < tokens.Length ? TextSpan.FromBounds(tokens[index - 1].End, tokens[index + 1].Start) : token.Span;
            return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.NamedArgumentEquals(source.Slice(tokens[index - 1].Span)),
                new Fix(DiagnosticMessages.NamedArgumentFix, [new TextEdit(gap, index + 1 < tokens.Length ? ": " : ":")]));
        }
        // Datasheets write tolerances this way; say that they are not taken yet rather than "unexpected".
        if (token.Kind == TokenKind.PlusMinus)
            return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.PlusMinusNotYet);
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.Unexpected(Describe(token.Kind, source.Slice(token.Span)), expected));
    }

    /// <summary>
    /// <c>5 ft 3 in</c>: two quantities with nothing between them. Shop drawings write feet and
    /// inches this way, so when both units measure the same thing the fix adds them.
    /// </summary>
    private static Diagnostic SideBySide(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index)
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
    private static Diagnostic? SpacedDigits(SourceText source, ReadOnlySpan<SyntaxToken> tokens, int index)
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

    /// <summary>
    /// <c>use screws.cutsheet</c>: a library named with the file extension, or a workspace sheet
    /// without its quotes. The fix drops the extension of a library and quotes anything else.
    /// </summary>
    private static Diagnostic? UseWithExtension(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
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
    private static Diagnostic NotAStatement(SourceText source, ReadOnlySpan<SyntaxToken> tokens, TextSpan span)
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
    private static Diagnostic? CheckOperatorMistake(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
    {
        for (int i = 1; i < tokens.Length; i++)
        {
            var t = tokens[i];
            var next = i + 1 < tokens.Length ? tokens[i + 1] : default;
            var previous = tokens[i - 1];
            if (t.Kind != TokenKind.Equals) continue;
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
    private static Diagnostic? ChoiceWithCommas(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
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

    private static StatementSyntax WithDescription(StatementSyntax statement, SourceText source, SyntaxToken comment) =>
        Description(source, comment) is { } description ? statement with { Clauses = statement.Clauses with { Description = description } } : statement;

    /// <summary>The text of a comment after <c>//</c>, trimmed; null when there is none.</summary>
    private static TextValueSyntax? Description(SourceText source, SyntaxToken comment)
    {
        var text = source.Text.AsSpan(comment.Start + 2, comment.Length - 2).Trim();
        return text.IsEmpty ? null : new TextValueSyntax(text.ToString(), comment.Span);
    }

    /// <summary>Reports token-level problems; true when the statement cannot be parsed meaningfully.</summary>
    private static bool ScanTokens(SourceText source, ReadOnlySpan<SyntaxToken> tokens, List<Diagnostic> diagnostics)
    {
        if (tokens.Length > MaxTokensPerStatement)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.LimitExceeded, tokens[0].Span, DiagnosticMessages.LimitExceeded($"a statement has more than {MaxTokensPerStatement} tokens")));
            return true;
        }
        bool fatal = false;
        int depth = 0, maxDepth = 0, prefixRun = 0, maxPrefixRun = 0;
        // The open brackets not yet closed, innermost last (deeper than the limit is an error anyway).
        Span<int> open = stackalloc int[MaxDepth + 1];
        foreach (var t in tokens)
        {
            switch (t.Kind)
            {
                case TokenKind.Error when source.Text[t.Start] == '⌀':
                case TokenKind.Identifier when t.Length > 1 && source.Text[t.Start] is 'Ø' or 'ø' && char.IsAsciiDigit(source.Text[t.Start + 1]):
                    // Ø20 copied from a drawing: Ø reads as a letter, so the whole would be a name.
                    string sign = source.Text[t.Start].ToString();
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnexpectedCharacter, new TextSpan(t.Start, 1), DiagnosticMessages.DiameterSign(sign),
                        new Fix(DiagnosticMessages.RemoveFix(sign), [new TextEdit(new TextSpan(t.Start, 1), "")])));
                    fatal = true;
                    break;
                case TokenKind.Error:
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnexpectedCharacter, t.Span, DiagnosticMessages.UnexpectedCharacter(source.Slice(t.Span))));
                    fatal = true;
                    break;
                case TokenKind.String when (t.Flags & TokenFlags.Unterminated) != 0:
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnterminatedString, t.Span, DiagnosticMessages.UnterminatedString));
                    fatal = true;
                    break;
                case TokenKind.Unit when t.Length == 1:
                    char mark = source.Text[t.Start];
                    if (mark is '"' or '″')
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.InchMark, t.Span, DiagnosticMessages.InchMark,
                            new Fix("write in", [new TextEdit(t.Span, " in")])));
                    else if (mark is '\'' or '′')
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.FootMark, t.Span, DiagnosticMessages.FootMark,
                            new Fix("write ft", [new TextEdit(t.Span, " ft")])));
                    break;
                case TokenKind.Number when (t.Flags & TokenFlags.DecimalComma) == 0 && !NumberText.IsFinite(source.Text.AsSpan(t.Start, t.Length)):
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NotFinite, t.Span, DiagnosticMessages.NumberNotFinite(source.Slice(t.Span))));
                    fatal = true;
                    break;
                case TokenKind.Number when (t.Flags & TokenFlags.DecimalComma) != 0:
                    string written = source.Slice(t.Span);
                    int comma = written.IndexOf(',');
                    string? fixedText = written.Length - comma - 1 == 3 ? null : written.Replace(',', '.');
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.DecimalComma, t.Span, DiagnosticMessages.DecimalComma(written, fixedText),
                        fixedText is null ? null : new Fix($"write {fixedText}", [new TextEdit(t.Span, fixedText)])));
                    break;
                case TokenKind.LParen or TokenKind.LBracket:
                    if (depth <= MaxDepth) open[depth] = t.Start;
                    depth++;
                    maxDepth = Math.Max(maxDepth, depth);
                    break;
                case TokenKind.RParen or TokenKind.RBracket:
                    if (depth == 0)
                    {
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnbalancedBracket, t.Span, DiagnosticMessages.StrayClosingBracket));
                        fatal = true;
                    }
                    else depth--;
                    break;
            }
            bool prefix = t.Kind is TokenKind.Minus or TokenKind.Plus or TokenKind.Not or TokenKind.Caret or TokenKind.If;
            prefixRun = prefix ? prefixRun + 1 : t.Kind is TokenKind.Number or TokenKind.Identifier or TokenKind.Unit ? prefixRun : 0;
            maxPrefixRun = Math.Max(maxPrefixRun, prefixRun);
        }
        if (depth > 0 && !fatal)
        {
            int at = open[Math.Min(depth, MaxDepth + 1) - 1];
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnbalancedBracket, new TextSpan(at, 1), DiagnosticMessages.UnbalancedBracket));
            fatal = true;
        }
        if (maxDepth > MaxDepth || maxPrefixRun > MaxDepth)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NestingTooDeep, tokens[0].Span, DiagnosticMessages.NestingTooDeep));
            fatal = true;
        }
        return fatal;
    }

    internal static TokenList<TokenKind> ToTokenList(SourceText source, ReadOnlySpan<SyntaxToken> tokens)
    {
        var list = new Token<TokenKind>[tokens.Length];
        for (int k = 0; k < tokens.Length; k++)
        {
            var t = tokens[k];
            var p = source.GetPosition(t.Start);
            list[k] = new Token<TokenKind>(t.Kind, new Superpower.Model.TextSpan(source.Text, new Position(t.Start, p.Line + 1, p.Column + 1), t.Length));
        }
        return new TokenList<TokenKind>(list);
    }

    private static Diagnostic ParseError(SourceText source, ReadOnlySpan<SyntaxToken> tokens, TokenListParserResult<TokenKind, StatementSyntax> result)
    {
        string expected = result.Expectations is { Length: > 0 } e ? string.Join(", ", e.Distinct().Take(6)) : "more";
        if (result.Location.IsAtEnd)
        {
            return Diagnostic.Error(DiagnosticCodes.IncompleteStatement, new TextSpan(tokens[^1].End, 0), DiagnosticMessages.Incomplete("expected " + expected));
        }
        var token = result.Location.First();
        var span = new TextSpan(token.Span.Position.Absolute, token.Span.Length);
        int at = IndexAt(tokens, span.Start);
        if (token.Kind == TokenKind.Identifier && at > 0 && at < tokens.Length && tokens[at - 1].Kind is TokenKind.Identifier or TokenKind.RParen
            && Units.UnitCatalog.Default.IsSymbol(token.ToStringValue()))
        {
            return Diagnostic.Error(DiagnosticCodes.UnitWithoutNumber, span, DiagnosticMessages.UnitWithoutNumber);
        }
        if (at < tokens.Length && FunctionHeadMistake(tokens, at, span) is { } head) return head;
        if (UseWithExtension(source, tokens) is { } use) return use;
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.Unexpected(Describe(token), expected));
    }

    /// <summary>
    /// A function written without the kinds the language asks for: <c>f(x) = …</c> (a parameter
    /// without its kind) or <c>f(x: length) = …</c> (no return kind). Null for any other mistake.
    /// </summary>
    private static Diagnostic? FunctionHeadMistake(ReadOnlySpan<SyntaxToken> tokens, int at, TextSpan span)
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

    private static string Describe(Token<TokenKind> token) => Describe(token.Kind, token.ToStringValue());

    private static string Describe(TokenKind kind, string text) => kind switch
    {
        TokenKind.Identifier => $"name '{text}'",
        TokenKind.Number => $"number {text}",
        TokenKind.Unit => $"unit '{text}'",
        TokenKind.String => "text in quotes",
        _ => $"'{text}'",
    };

    private static StatementSyntax Recover(SourceText source, ReadOnlySpan<SyntaxToken> tokens, TextSpan span)
    {
        var first = tokens[0];
        if (first.Kind == TokenKind.Identifier && tokens.Length >= 2 && tokens[1].Kind == TokenKind.Equals)
        {
            var rest = tokens.Length > 2 ? TextSpan.FromBounds(tokens[2].Start, span.End) : new TextSpan(tokens[1].End, 0);
            return new DefinitionSyntax(span, source.Slice(first.Span), first.Span, new ErrorExpressionSyntax(rest));
        }
        if (first.Kind == TokenKind.Identifier && tokens.Length >= 2 && tokens[1].Kind == TokenKind.LParen)
        {
            var header = StatementGrammar.FunctionHeader(ToTokenList(source, tokens));
            if (header.HasValue)
            {
                var (name, parameters, kind) = header.Value;
                var rest = header.Remainder.IsAtEnd ? new TextSpan(span.End, 0)
                    : TextSpan.FromBounds(header.Remainder.First().Span.Position.Absolute, span.End);
                return new FunctionSyntax(span, name.ToStringValue(), TokenSpans.Of(name), parameters, kind.ToStringValue(), TokenSpans.Of(kind),
                    new ErrorExpressionSyntax(rest));
            }
        }
        return new ErrorStatementSyntax(span);
    }
}
