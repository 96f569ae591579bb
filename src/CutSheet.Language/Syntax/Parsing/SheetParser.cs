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
    private const int MaxTokensPerStatement = 4000;

    public static SheetSyntax Parse(SourceText source)
    {
        var tokens = Tokenizer.Tokenize(source.Text);
        var diagnostics = new List<Diagnostic>();
        var statements = new List<StatementSyntax>();
        foreach (var group in Group(tokens))
        {
            var statement = ParseStatement(source, tokens, group, diagnostics);
            if (statement is not null) statements.Add(statement);
        }
        return new SheetSyntax(source, tokens, statements, diagnostics);
    }

    /// <summary>Indices of the significant tokens of each statement (newlines excluded) and the description comment.</summary>
    private sealed record StatementGroup(List<int> Indices, int CommentIndex, bool IsFunction);

    private static List<StatementGroup> Group(SyntaxToken[] tokens)
    {
        var groups = new List<StatementGroup>();
        int i = 0;
        while (i < tokens.Length)
        {
            var line = new List<int>();
            int comment = -1;
            bool indented = false;
            for (; i < tokens.Length && tokens[i].Kind != TokenKind.Newline; i++)
            {
                var t = tokens[i];
                if (t.Kind == TokenKind.Comment) { if (line.Count > 0) comment = i; continue; }
                if (t.Kind == TokenKind.Whitespace) { if (line.Count == 0 && (t.Flags & TokenFlags.Indented) != 0) indented = true; continue; }
                if (t.Kind == TokenKind.TriviaNewline) continue;
                line.Add(i);
            }
            i++; // the newline
            if (line.Count == 0) continue;
            var first = tokens[line[0]].Kind;
            var previous = groups.Count > 0 ? groups[^1] : null;
            bool continues = indented && previous is not null && tokens[previous.Indices[0]].Kind != TokenKind.Heading && (
                first is TokenKind.Source or TokenKind.Assumed or TokenKind.Accepted or TokenKind.Valid or TokenKind.Require
                    or TokenKind.Where or TokenKind.Row
                || (first is TokenKind.Caution or TokenKind.Notice or TokenKind.Warning && previous.IsFunction));
            if (continues)
            {
                previous!.Indices.AddRange(line);
                continue;
            }
            bool isFunction = first == TokenKind.Identifier && line.Count > 1 && tokens[line[1]].Kind == TokenKind.LParen;
            groups.Add(new StatementGroup(line, comment, isFunction));
        }
        return groups;
    }

    private static StatementSyntax? ParseStatement(SourceText source, SyntaxToken[] all, StatementGroup group, List<Diagnostic> diagnostics)
    {
        var idx = group.Indices;
        var first = all[idx[0]];
        var span = TextSpan.FromBounds(first.Start, all[idx[^1]].End);

        if (first.Kind == TokenKind.Heading)
        {
            string text = source.Slice(first.Span);
            int level = 0;
            while (level < text.Length && text[level] == '#') level++;
            if (idx.Count > 1) diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnexpectedToken, span, DiagnosticMessages.NotAStatement));
            return new HeadingSyntax(first.Span, level, text[level..].Trim());
        }

        bool fatal = ScanTokens(source, all, idx, diagnostics);
        StatementSyntax? statement = null;
        if (!fatal && first.Kind == TokenKind.Identifier && idx.Count > 1 && all[idx[1]].Kind == TokenKind.Equals)
        {
            statement = ParseDefinition(source, all, idx, diagnostics);
        }
        else if (!fatal)
        {
            var second = idx.Count > 1 ? all[idx[1]].Kind : TokenKind.None;
            var parser = StatementGrammar.For(first.Kind, second);
            if (parser is null)
            {
                diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NotAStatement, span, DiagnosticMessages.NotAStatement));
                return new ErrorStatementSyntax(span);
            }
            var list = ToTokenList(source, all, idx);
            var result = parser(list);
            if (result.HasValue)
            {
                statement = result.Value;
            }
            else
            {
                diagnostics.Add(ParseError(source, all, idx, result));
            }
        }
        statement ??= Recover(source, all, idx, span);
        return group.CommentIndex >= 0 ? WithDescription(statement, source, all[group.CommentIndex]) : statement;
    }

    /// <summary>
    /// The common statement, <c>name = expression [clauses]</c>, parsed directly (the hot path);
    /// clauses, when present, go through the statement grammar.
    /// </summary>
    private static StatementSyntax? ParseDefinition(SourceText source, SyntaxToken[] all, List<int> idx, List<Diagnostic> diagnostics)
    {
        var tokens = new SyntaxToken[idx.Count];
        for (int k = 0; k < tokens.Length; k++) tokens[k] = all[idx[k]];
        var name = tokens[0];
        var result = ExpressionParser.Parse(tokens, source.Text, 2);
        if (result.Expression is null)
        {
            diagnostics.Add(ExpressionError(source, tokens, result.ErrorIndex, result.Expected));
            return null;
        }
        var clauses = ClausesSyntax.Empty;
        if (result.Next < tokens.Length)
        {
            var rest = StatementGrammar.Clauses.AtEnd()(ToTokenList(source, all, idx.GetRange(result.Next, idx.Count - result.Next)));
            if (!rest.HasValue)
            {
                var at = rest.Location.IsAtEnd ? tokens.Length : result.Next + idx.GetRange(result.Next, idx.Count - result.Next).FindIndex(i => all[i].Start == rest.Location.First().Span.Position.Absolute);
                diagnostics.Add(ExpressionError(source, tokens, at, "an operator, 'as', a clause (assumed, source, accepted) or the end of the line"));
                return null;
            }
            clauses = rest.Value;
        }
        var span = TextSpan.FromBounds(name.Start, tokens[^1].End);
        return new DefinitionSyntax(span, source.Text.Substring(name.Start, name.Length), name.Span, result.Expression) { Clauses = clauses };
    }

    private static Diagnostic ExpressionError(SourceText source, SyntaxToken[] tokens, int index, string expected)
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
        return Diagnostic.Error(DiagnosticCodes.UnexpectedToken, token.Span, DiagnosticMessages.Unexpected(Describe(token.Kind, source.Slice(token.Span)), expected));
    }

    private static StatementSyntax WithDescription(StatementSyntax statement, SourceText source, SyntaxToken comment)
    {
        string text = source.Slice(comment.Span)[2..].Trim();
        if (text.Length == 0) return statement;
        return statement with { Clauses = statement.Clauses with { Description = new TextValueSyntax(text, comment.Span) } };
    }

    /// <summary>Reports token-level problems; true when the statement cannot be parsed meaningfully.</summary>
    private static bool ScanTokens(SourceText source, SyntaxToken[] all, List<int> idx, List<Diagnostic> diagnostics)
    {
        bool fatal = false;
        int depth = 0, maxDepth = 0, prefixRun = 0, maxPrefixRun = 0;
        var open = new Stack<SyntaxToken>();
        if (idx.Count > MaxTokensPerStatement)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NestingTooDeep, all[idx[0]].Span, DiagnosticMessages.LimitExceeded($"a statement has more than {MaxTokensPerStatement} tokens")));
            return true;
        }
        foreach (int i in idx)
        {
            var t = all[i];
            switch (t.Kind)
            {
                case TokenKind.Error:
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnexpectedCharacter, t.Span, DiagnosticMessages.UnexpectedCharacter(source.Slice(t.Span))));
                    fatal = true;
                    break;
                case TokenKind.String when (t.Flags & TokenFlags.Unterminated) != 0:
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnterminatedString, t.Span, DiagnosticMessages.UnterminatedString));
                    fatal = true;
                    break;
                case TokenKind.Unit:
                    string unit = source.Slice(t.Span);
                    if (unit is "\"" or "″")
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.InchMark, t.Span, DiagnosticMessages.InchMark,
                            new Fix("write in", [new TextEdit(t.Span, " in")])));
                    else if (unit is "'" or "′")
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.FootMark, t.Span, DiagnosticMessages.FootMark,
                            new Fix("write ft", [new TextEdit(t.Span, " ft")])));
                    break;
                case TokenKind.Number when (t.Flags & TokenFlags.DecimalComma) != 0:
                    string written = source.Slice(t.Span);
                    int comma = written.IndexOf(',');
                    string? fixedText = written.Length - comma - 1 == 3 ? null : written.Replace(',', '.');
                    diagnostics.Add(Diagnostic.Error(DiagnosticCodes.DecimalComma, t.Span, DiagnosticMessages.DecimalComma(written, fixedText),
                        fixedText is null ? null : new Fix($"write {fixedText}", [new TextEdit(t.Span, fixedText)])));
                    break;
                case TokenKind.LParen or TokenKind.LBracket:
                    open.Push(t);
                    depth++;
                    maxDepth = Math.Max(maxDepth, depth);
                    break;
                case TokenKind.RParen or TokenKind.RBracket:
                    if (open.Count == 0)
                    {
                        diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnbalancedBracket, t.Span, DiagnosticMessages.UnbalancedBracket));
                        fatal = true;
                    }
                    else { open.Pop(); depth--; }
                    break;
            }
            bool prefix = t.Kind is TokenKind.Minus or TokenKind.Plus or TokenKind.Not or TokenKind.Caret or TokenKind.If;
            prefixRun = prefix ? prefixRun + 1 : t.Kind is TokenKind.Number or TokenKind.Identifier or TokenKind.Unit ? prefixRun : 0;
            if (t.Kind is TokenKind.Number or TokenKind.Identifier && !prefix) prefixRun = Math.Max(0, prefixRun);
            maxPrefixRun = Math.Max(maxPrefixRun, prefixRun);
        }
        if (open.Count > 0 && !fatal)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.UnbalancedBracket, open.Peek().Span, DiagnosticMessages.UnbalancedBracket));
            fatal = true;
        }
        if (maxDepth > MaxDepth || maxPrefixRun > MaxDepth)
        {
            diagnostics.Add(Diagnostic.Error(DiagnosticCodes.NestingTooDeep, all[idx[0]].Span, DiagnosticMessages.NestingTooDeep));
            fatal = true;
        }
        return fatal;
    }

    private static TokenList<TokenKind> ToTokenList(SourceText source, SyntaxToken[] all, List<int> idx)
    {
        var list = new Token<TokenKind>[idx.Count];
        for (int k = 0; k < idx.Count; k++)
        {
            var t = all[idx[k]];
            var p = source.GetPosition(t.Start);
            list[k] = new Token<TokenKind>(t.Kind, new Superpower.Model.TextSpan(source.Text, new Position(t.Start, p.Line + 1, p.Column + 1), t.Length));
        }
        return new TokenList<TokenKind>(list);
    }

    private static Diagnostic ParseError(SourceText source, SyntaxToken[] all, List<int> idx, TokenListParserResult<TokenKind, StatementSyntax> result)
    {
        string expected = result.Expectations is { Length: > 0 } e ? string.Join(", ", e.Distinct().Take(6)) : "more";
        if (result.Location.IsAtEnd)
        {
            var last = all[idx[^1]];
            return Diagnostic.Error(DiagnosticCodes.IncompleteStatement, new TextSpan(last.End, 0), DiagnosticMessages.Incomplete("expected " + expected));
        }
        var token = result.Location.First();
        var span = new TextSpan(token.Span.Position.Absolute, token.Span.Length);
        int at = idx.FindIndex(i => all[i].Start == span.Start);
        if (token.Kind == TokenKind.Identifier && at > 0 && all[idx[at - 1]].Kind is TokenKind.Identifier or TokenKind.RParen
            && Units.UnitCatalog.Default.IsSymbol(token.ToStringValue()))
        {
            return Diagnostic.Error(DiagnosticCodes.UnitWithoutNumber, span, DiagnosticMessages.UnitWithoutNumber);
        }
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

    private static StatementSyntax Recover(SourceText source, SyntaxToken[] all, List<int> idx, TextSpan span)
    {
        var first = all[idx[0]];
        if (first.Kind == TokenKind.Identifier && idx.Count >= 2 && all[idx[1]].Kind == TokenKind.Equals)
        {
            var rest = idx.Count > 2 ? TextSpan.FromBounds(all[idx[2]].Start, span.End) : new TextSpan(all[idx[1]].End, 0);
            return new DefinitionSyntax(span, source.Slice(first.Span), first.Span, new ErrorExpressionSyntax(rest));
        }
        if (first.Kind == TokenKind.Identifier && idx.Count >= 2 && all[idx[1]].Kind == TokenKind.LParen)
        {
            var header = StatementGrammar.FunctionHeader(ToTokenList(source, all, idx));
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
