using CutSheet.Editing.Analysis;
using CutSheet.Editing.Signatures;
using CutSheet.Editing.Values;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Completion;

/// <summary>
/// Completions for the place being typed: Greek letters after a backslash, superscript powers
/// after <c>^</c>, units right after a number or after <c>as</c> (where the language reads a
/// unit), the names of an imported sheet after <c>alias.</c>, and elsewhere the names in
/// scope, the functions with their signatures, the constants and the keywords.
/// </summary>
public static class CompletionProvider
{
    /// <summary>At most this many units are offered at once; typing more narrows the list.</summary>
    public const int UnitLimit = 150;

    /// <summary>Units offered first: those a machine-tool sheet uses most.</summary>
    private static readonly string[] CommonUnits =
    [
        "mm", "m", "in", "ft", "µm", "N", "kN", "lbf", "N·m", "lbf·in", "lbf·ft", "rpm", "rev", "mm/rev", "in/rev", "mm/min", "in/min",
        "m/min", "m/s", "s", "min", "h", "kW", "W", "hp", "kg", "lb", "MPa", "N/mm²", "psi", "GPa", "deg", "°", "rad", "Hz", "%",
    ];

    /// <summary>
    /// Completions at <paramref name="offset"/>. <paramref name="trigger"/> is the character whose
    /// typing asked for them (null when asked for by hand): a space asks only for units after a
    /// number or <c>as</c>, a dot only for an imported sheet's names, so typing stays quiet elsewhere.
    /// </summary>
    public static CompletionResult Complete(SheetAnalysis analysis, int offset, string? trigger = null)
    {
        var result = Complete(analysis, offset);
        bool wanted = trigger switch
        {
            " " => result.Items.Count > 0 && result.Items[0].Category == CompletionCategory.Unit,
            "." => result.Items.Count > 0 && result.Items[0].Category != CompletionCategory.Unit && result.Items[0].Replace.Start > 0 && analysis.Text[result.Items[0].Replace.Start - 1] == '.',
            _ => true,
        };
        return wanted ? result : CompletionResult.Empty;
    }

    private static CompletionResult Complete(SheetAnalysis analysis, int offset)
    {
        offset = Math.Clamp(offset, 0, analysis.Text.Length);
        var source = analysis.Source;
        int lineStart = source.LineStart(source.GetPosition(offset).Line);
        string before = analysis.Text[lineStart..offset];

        if (Greek(before, offset) is { } greek) return greek;
        if (Power(before, offset) is { } power) return power;

        var tokens = analysis.Result.Syntax.Tokens;
        int index = TokenBefore(tokens, offset);
        var token = index >= 0 ? tokens[index] : default;
        if (token.Kind == TokenKind.Unit && token.End == offset)
            return Units(analysis.Source.Slice(TextSpan.FromBounds(token.Start, offset)), TextSpan.FromBounds(token.Start, offset));
        var previous = PreviousSignificant(tokens, index, offset);
        if (previous is TokenKind.As || (previous is TokenKind.Number && IsAfterNumberGap(tokens, index, offset)))
            return Units("", new TextSpan(offset, 0));

        int wordStart = offset;
        while (wordStart > lineStart && IsNameChar(analysis.Text[wordStart - 1])) wordStart--;
        var replace = TextSpan.FromBounds(wordStart, offset);
        if (IsKindPlace(analysis.Text[lineStart..wordStart])) return new CompletionResult(KindNames(analysis, replace).ToList(), false);
        if (wordStart > lineStart && analysis.Text[wordStart - 1] == '.')
        {
            int qualifierEnd = wordStart - 1, qualifierStart = qualifierEnd;
            while (qualifierStart > lineStart && IsNameChar(analysis.Text[qualifierStart - 1])) qualifierStart--;
            string qualifier = analysis.Text[qualifierStart..qualifierEnd];
            return analysis.Result.Scope.Namespaces.TryGetValue(qualifier, out var ns)
                ? new CompletionResult(Symbols(ns.OwnSymbols(), replace, analysis.Result.Display.Digits).ToList(), false)
                : CompletionResult.Empty;
        }
        return new CompletionResult(Names(analysis, replace, offset).ToList(), false);
    }

    private static CompletionResult? Greek(string before, int offset)
    {
        int i = before.Length;
        while (i > 0 && char.IsAsciiLetter(before[i - 1])) i--;
        if (i == 0 || before[i - 1] != '\\') return null;
        string typed = before[i..];
        var replace = TextSpan.FromBounds(offset - typed.Length - 1, offset);
        var items = GreekLetters.All
            .Where(g => g.Name.StartsWith(typed, StringComparison.OrdinalIgnoreCase))
            .Select(g => new CompletionEntry(g.Letter, CompletionCategory.Letter, g.Letter, replace, Detail: "\\" + g.Name, FilterText: "\\" + g.Name))
            .ToList();
        return new CompletionResult(items, false);
    }

    private static CompletionResult? Power(string before, int offset)
    {
        int caret = before.LastIndexOf('^');
        if (caret < 0) return null;
        string exponent = before[(caret + 1)..];
        if (exponent is not ("" or "-" or "2" or "3" or "4" or "-1" or "-2" or "-3")) return null;
        var replace = TextSpan.FromBounds(offset - exponent.Length - 1, offset);
        var items = new[] { 2, 3, 4, -1, -2, -3 }
            .Where(p => p.ToString(System.Globalization.CultureInfo.InvariantCulture).StartsWith(exponent, StringComparison.Ordinal))
            .Select((p, i) =>
            {
                string text = "^" + p.ToString(System.Globalization.CultureInfo.InvariantCulture);
                return new CompletionEntry(Superscript.Of(p), CompletionCategory.Letter, Superscript.Of(p), replace,
                    Detail: text, FilterText: text, SortText: i.ToString("D2", System.Globalization.CultureInfo.InvariantCulture));
            })
            .ToList();
        return new CompletionResult(items, false);
    }

    private static CompletionResult Units(string typed, TextSpan replace)
    {
        var matches = UnitCatalog.Default.Symbols
            .Where(u => u.Symbol.StartsWith(typed, StringComparison.OrdinalIgnoreCase))
            .Select(u => (Unit: u, Rank: Array.IndexOf(CommonUnits, u.Symbol) is var r && r >= 0 ? r : CommonUnits.Length))
            // Unit symbols are case-sensitive (m, M, mm, Mm): exact-case matches first.
            .OrderBy(x => x.Unit.Symbol.StartsWith(typed, StringComparison.Ordinal) ? 0 : 1).ThenBy(x => x.Rank).ThenBy(x => x.Unit.Symbol.Length).ThenBy(x => x.Unit.Symbol, StringComparer.Ordinal)
            .ToList();
        var items = matches.Take(UnitLimit)
            .Select((x, i) => new CompletionEntry(x.Unit.Symbol, CompletionCategory.Unit, x.Unit.Symbol, replace,
                Detail: x.Unit.Name, Documentation: x.Unit.Note, SortText: i.ToString("D4", System.Globalization.CultureInfo.InvariantCulture)))
            .ToList();
        return new CompletionResult(items, matches.Count > UnitLimit);
    }

    private static IEnumerable<CompletionEntry> Names(SheetAnalysis analysis, TextSpan replace, int offset)
    {
        var scope = analysis.Result.Scope;
        int digits = analysis.Result.Display.Digits;
        var seen = new HashSet<string>(StringComparer.Ordinal);

        // Inside a function: its parameters and locals come first.
        foreach (var f in analysis.Result.Syntax.Statements.OfType<Language.Syntax.Nodes.FunctionSyntax>().Where(f => f.Span.ContainsOrTouches(offset)))
        {
            foreach (var p in f.Parameters)
                if (seen.Add(p.Name)) yield return new CompletionEntry(p.Name, CompletionCategory.Parameter, p.Name, replace, Detail: p.KindName, SortText: "0" + p.Name);
            foreach (var l in f.Clauses.Locals)
                if (seen.Add(l.Name)) yield return new CompletionEntry(l.Name, CompletionCategory.Definition, l.Name, replace, SortText: "0" + l.Name);
        }
        // The definition being written is not offered to itself.
        bool Writing(DefinitionSymbol d) => d.Path == analysis.Path && d.Syntax.Span.Start <= offset
            && offset <= analysis.Source.LineEnd(analysis.Source.GetPosition(d.Syntax.Span.End).Line);
        var own = scope.OwnSymbols().Where(s => !(s.Symbol is DefinitionSymbol d && Writing(d)));
        foreach (var e in Symbols(own, replace, digits, analysis))
            if (seen.Add(e.Label)) yield return e;
        foreach (var e in Symbols(scope.Imported.Select(i => (i.Key, i.Value.Symbol)), replace, digits))
            if (seen.Add(e.Label)) yield return e;
        foreach (var alias in scope.Namespaces.Keys)
            if (seen.Add(alias)) yield return new CompletionEntry(alias, CompletionCategory.Namespace, alias, replace, Detail: "imported sheet " + scope.Namespaces[alias].DisplayName, SortText: "2" + alias);
        foreach (var f in BuiltinCatalog.Functions)
            if (seen.Add(f.Name)) yield return new CompletionEntry(f.Name, CompletionCategory.Function, f.Name, replace, Detail: f.Signature, Documentation: f.Description, SortText: "3" + f.Name);
        foreach (var c in BuiltinCatalog.Constants.Keys)
            if (seen.Add(c)) yield return new CompletionEntry(c, CompletionCategory.Constant, c, replace, Detail: "constant", SortText: "3" + c);
        foreach (var k in Keywords.All.Order(StringComparer.Ordinal))
            if (seen.Add(k)) yield return new CompletionEntry(k, CompletionCategory.Keyword, k, replace, SortText: "4" + k);
    }

    private static IEnumerable<CompletionEntry> Symbols(IEnumerable<(string Name, object Symbol)> symbols, TextSpan replace, int digits, SheetAnalysis? own = null)
    {
        foreach (var (name, symbol) in symbols)
        {
            yield return symbol switch
            {
                DefinitionSymbol d => new CompletionEntry(name, CompletionCategory.Definition, name, replace,
                    Detail: DefinitionValue(d, digits, own), Documentation: d.Syntax.Clauses.Description?.Value, SortText: "1" + name),
                FunctionSymbol f => new CompletionEntry(name, CompletionCategory.Function, name, replace,
                    Detail: SignatureText.Of(f.Syntax, f.Home.SourceText), Documentation: f.Syntax.Clauses.Description?.Value, SortText: "1" + name),
                ChoiceOption o => new CompletionEntry(name, CompletionCategory.Option, name, replace, Detail: "option of " + o.Type.Name, SortText: "1" + name),
                TableSymbol t => new CompletionEntry(name, CompletionCategory.Table, name, replace, Detail: "table", SortText: "1" + name),
                ChoiceType c => new CompletionEntry(name, CompletionCategory.Choice, name, replace, Detail: "choice", SortText: "1" + name),
                _ => new CompletionEntry(name, CompletionCategory.Kind, name, replace, Detail: "kind", SortText: "1" + name),
            };
        }
    }

    /// <summary>
    /// After a ':' in a function's head (before the line's first '='): a parameter's or the
    /// return's kind. A ':' after the '=' belongs to a named argument and is left to names.
    /// </summary>
    private static bool IsKindPlace(string before)
    {
        string trimmed = before.TrimEnd();
        return trimmed.EndsWith(':') && !trimmed.Contains('=') && trimmed.Contains('(');
    }

    private static IEnumerable<CompletionEntry> KindNames(SheetAnalysis analysis, TextSpan replace)
    {
        var scope = analysis.Result.Scope;
        foreach (var k in scope.Kinds.Values)
            yield return new CompletionEntry(k.Name, CompletionCategory.Kind, k.Name, replace, Detail: k.Description, SortText: "0" + k.Name);
        foreach (var c in scope.Choices.Values)
            yield return new CompletionEntry(c.Name, CompletionCategory.Choice, c.Name, replace, Detail: "choice", SortText: "0" + c.Name);
        foreach (var k in Kinds.Builtin.Where(k => k.AmbiguousWith is null))
            yield return new CompletionEntry(k.Name, CompletionCategory.Kind, k.Name, replace, Detail: k.Description, SortText: "1" + k.Name);
        foreach (var word in new[] { "number", "list", "boolean" })
            yield return new CompletionEntry(word, CompletionCategory.Kind, word, replace, SortText: "2" + word);
    }

    private static string? DefinitionValue(DefinitionSymbol d, int digits, SheetAnalysis? own)
    {
        if (own is not null && own.Result.Definitions.FirstOrDefault(r => r.Definition.NameSpan == d.Syntax.NameSpan) is { } result)
            return result.Value?.Text;
        return ValueText.Of(d, digits);
    }

    private static int TokenBefore(IReadOnlyList<SyntaxToken> tokens, int offset)
    {
        int found = -1;
        for (int i = 0; i < tokens.Count && tokens[i].Start < offset; i++) found = i;
        return found;
    }

    private static TokenKind PreviousSignificant(IReadOnlyList<SyntaxToken> tokens, int index, int offset)
    {
        for (int i = index; i >= 0; i--)
        {
            var t = tokens[i];
            if (t.Kind is TokenKind.Newline or TokenKind.TriviaNewline) return TokenKind.Newline;
            if (t.IsTrivia) continue;
            // The word being typed is not the token before it.
            if (t.End == offset && t.Kind is TokenKind.Identifier || Keywords.IsKeyword(t.Kind) && t.End == offset && t.Kind != TokenKind.As) continue;
            return t.Kind;
        }
        return TokenKind.Newline;
    }

    /// <summary>Right after a number, or after a number and spaces: where a unit may follow.</summary>
    private static bool IsAfterNumberGap(IReadOnlyList<SyntaxToken> tokens, int index, int offset) =>
        index >= 0 && (tokens[index].Kind == TokenKind.Number && tokens[index].End == offset
            || tokens[index].Kind == TokenKind.Whitespace && tokens[index].End == offset && index > 0 && tokens[index - 1].Kind == TokenKind.Number);

    private static bool IsNameChar(char c) => char.IsLetterOrDigit(c) || c == '_' || c == '\'' || c == '′';
}
