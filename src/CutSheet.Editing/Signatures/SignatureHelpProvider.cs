using CutSheet.Editing.Analysis;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Signatures;

/// <summary>
/// The signature of the call the cursor is in, from the token stream (the line being typed
/// rarely parses): the innermost open <c>(</c> after a function name, the argument index by
/// counting commas, or the parameter named by <c>name:</c>.
/// </summary>
public static class SignatureHelpProvider
{
    public static SignatureInfo? Help(SheetAnalysis analysis, int offset)
    {
        var tokens = analysis.Result.Syntax.Tokens;
        var open = new Stack<(int Paren, int Commas, string? Named)>();
        int start = analysis.Source.LineStart(analysis.Source.GetPosition(offset).Line);
        // Start at the statement's first line: a call may run over indented lines.
        var statement = analysis.Result.Syntax.Statements.FirstOrDefault(s => s.Span.ContainsOrTouches(offset));
        if (statement is not null) start = Math.Min(start, statement.Span.Start);
        for (int i = 0; i < tokens.Count && tokens[i].Start < offset; i++)
        {
            var t = tokens[i];
            if (t.End <= start) continue;
            switch (t.Kind)
            {
                case TokenKind.LParen: open.Push((i, 0, null)); break;
                case TokenKind.RParen when t.End <= offset: if (open.Count > 0) open.Pop(); break;
                case TokenKind.Comma when open.Count > 0: var top = open.Pop(); open.Push((top.Paren, top.Commas + 1, null)); break;
                case TokenKind.Colon when open.Count > 0 && Previous(tokens, i) is { Kind: TokenKind.Identifier } name:
                    var current = open.Pop();
                    open.Push((current.Paren, current.Commas, analysis.Source.Slice(name.Span)));
                    break;
            }
        }
        while (open.Count > 0)
        {
            var (paren, commas, named) = open.Pop();
            if (Previous(tokens, paren) is not { Kind: TokenKind.Identifier } callee) continue;
            var signature = Signature(analysis, callee.Span, analysis.Source.Slice(callee.Span));
            if (signature is null) continue;
            int active = named is null ? commas : signature.Parameters.ToList().FindIndex(p => p.StartsWith(named + ":", StringComparison.Ordinal));
            return signature with { ActiveParameter = active < 0 ? commas : Math.Min(active, Math.Max(0, signature.Parameters.Count - 1)) };
        }
        return null;
    }

    private static SignatureInfo? Signature(SheetAnalysis analysis, TextSpan callee, string name)
    {
        if (analysis.Index.At(callee.Start) is { Target.Symbol: FunctionSymbol f } occurrence)
            return new SignatureInfo(SignatureText.Of(f.Syntax, occurrence.Target.HomeText),
                SignatureText.Parameters(f.Syntax, occurrence.Target.HomeText).ToList(), 0, f.Syntax.Clauses.Description?.Value);
        if (analysis.Result.Scope.Find(name) is FunctionSymbol g)
            return new SignatureInfo(SignatureText.Of(g.Syntax, g.Home.SourceText), SignatureText.Parameters(g.Syntax, g.Home.SourceText).ToList(), 0, g.Syntax.Clauses.Description?.Value);
        foreach (var b in BuiltinCatalog.Functions)
        {
            if (b.Name != name) continue;
            // Built-in signatures are written "name(a, b): kind"; their parameters are the words between the brackets.
            int open = b.Signature.IndexOf('('), close = b.Signature.IndexOf(')');
            var parameters = open >= 0 && close > open
                ? b.Signature[(open + 1)..close].Split(", ", StringSplitOptions.RemoveEmptyEntries)
                : [];
            return new SignatureInfo(b.Signature, parameters, 0, b.Description);
        }
        return null;
    }

    private static SyntaxToken? Previous(IReadOnlyList<SyntaxToken> tokens, int index)
    {
        for (int i = index - 1; i >= 0; i--)
            if (!tokens[i].IsTrivia) return tokens[i];
        return null;
    }
}
