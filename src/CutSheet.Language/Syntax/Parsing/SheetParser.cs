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
                diagnostics.Add(CommonSlips.NotAStatement(source, tokens, span));
                return new ErrorStatementSyntax(span);
            }
            if (first.Kind == TokenKind.Check && CommonSlips.CheckOperator(source, tokens) is { } mistake)
            {
                diagnostics.Add(mistake);
            }
            else if (first.Kind == TokenKind.Choice && CommonSlips.ChoiceWithCommas(source, tokens) is { } commas)
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
            return CommonSlips.SideBySide(source, tokens, index);
        if (token.Kind == TokenKind.Number && index >= 1 && CommonSlips.SpacedDigits(source, tokens, index) is { } spaced) return spaced;
        if (CommonSlips.NamedArgumentWithEquals(source, tokens, index) is { } named) return named;
        // Datasheets write tolerances this way; say that they are not taken yet rather than "unexpected".
        if (token.Kind == TokenKind.PlusMinus)
            return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.PlusMinusNotYet);
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.Unexpected(Describe(token.Kind, source.Slice(token.Span)), expected));
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
        if (at < tokens.Length && CommonSlips.FunctionHead(tokens, at, span) is { } head) return head;
        if (at < tokens.Length && CommonSlips.NamedArgumentWithEquals(source, tokens, at) is { } named) return named;
        if (CommonSlips.UseWithExtension(source, tokens) is { } use) return use;
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.Unexpected(Describe(token), expected));
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
