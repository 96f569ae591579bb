using CutSheet.Editing.Analysis;
using CutSheet.Editing.Signatures;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Library;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Text;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Completion;

/// <summary>
/// Completions for the place being typed: Greek letters after a backslash, superscript powers
/// after <c>^</c>, units right after a number or after <c>as</c> (where the language reads a
/// unit), the names of an imported sheet after <c>alias.</c>, and elsewhere the names in
/// scope, the functions with their signatures, the constants and the keywords. Names are
/// filtered by the word being typed, ranked (<see cref="CompletionRanking"/>) and capped; a cut
/// list is incomplete, so the editor asks again as the user types.
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
        string typed = analysis.Text[wordStart..offset];
        if (IsKindPlace(analysis.Text[lineStart..wordStart])) return KindNames(analysis, typed, replace);
        if (wordStart > lineStart && analysis.Text[wordStart - 1] == '.')
        {
            int qualifierEnd = wordStart - 1, qualifierStart = qualifierEnd;
            while (qualifierStart > lineStart && IsNameChar(analysis.Text[qualifierStart - 1])) qualifierStart--;
            string qualifier = analysis.Text[qualifierStart..qualifierEnd];
            return analysis.Result.Scope.Namespaces.TryGetValue(qualifier, out var ns)
                ? Members(ns, qualifier, typed, replace)
                : CompletionResult.Empty;
        }
        return Names(analysis, typed, replace, offset, lineStart);
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
                Detail: x.Unit.Name, SortText: i.ToString("D4", System.Globalization.CultureInfo.InvariantCulture),
                Key: x.Unit.Note is null ? null : new CompletionKey(CompletionCategory.Unit, x.Unit.Symbol)))
            .ToList();
        return new CompletionResult(items, matches.Count > UnitLimit);
    }

    /// <summary>
    /// The names in scope that fit the typed word, ranked and capped. Only what is cheap goes
    /// into an entry (a function's signature, what kind of thing a name is); a definition's
    /// value and any documentation wait for <see cref="CompletionResolver"/>, so that a sheet
    /// of thousands of names costs one pass of string matches per request.
    /// </summary>
    private static CompletionResult Names(SheetAnalysis analysis, string typed, TextSpan replace, int offset, int lineStart) =>
        CompletionRanking.Rank(NameCandidates(analysis, typed, replace, offset, lineStart),
            c => Symbol(c.Label, c.Symbol!, replace, null));

    private static IEnumerable<CompletionCandidate> NameCandidates(SheetAnalysis analysis, string typed, TextSpan replace, int offset, int lineStart)
    {
        var scope = analysis.Result.Scope;
        var seen = new HashSet<string>(StringComparer.Ordinal);
        // Whether a name is offered is decided before anything else about it is computed.
        int Fits(string name) => seen.Contains(name) ? CompletionMatch.None : CompletionMatch.Of(typed, name);

        // Inside a function: its parameters and locals come first.
        foreach (var f in analysis.Result.Syntax.Statements.OfType<Language.Syntax.Nodes.FunctionSyntax>().Where(f => f.Span.ContainsOrTouches(offset)))
        {
            foreach (var p in f.Parameters)
                if (Fits(p.Name) is var m and >= 0 && seen.Add(p.Name))
                    yield return new(p.Name, m, CompletionGroup.Local, 0, new CompletionEntry(p.Name, CompletionCategory.Parameter, p.Name, replace, Detail: p.KindName));
            foreach (var l in f.Clauses.Locals)
                if (Fits(l.Name) is var m and >= 0 && seen.Add(l.Name))
                    yield return new(l.Name, m, CompletionGroup.Local, 0, new CompletionEntry(l.Name, CompletionCategory.Definition, l.Name, replace));
        }
        // The definition being written (it starts before the cursor and ends on the cursor's line or later) is not offered to itself.
        bool Writing(DefinitionSymbol d) => d.Path == analysis.Path && d.Syntax.Span.Start <= offset && d.Syntax.Span.End >= lineStart;
        foreach (var (name, symbol) in scope.OwnSymbols())
        {
            if (Fits(name) is not (var m and >= 0) || symbol is DefinitionSymbol d && Writing(d) || !seen.Add(name)) continue;
            yield return new(name, m, CompletionGroup.Own, Place(symbol, analysis, offset), Symbol: symbol);
        }
        foreach (var (name, imported) in scope.Imported)
            if (Fits(name) is var m and >= 0 && seen.Add(name))
                yield return new(name, m, CompletionGroup.Imported, 0, Symbol: imported.Symbol);
        foreach (var (alias, sheet) in scope.Namespaces)
            if (Fits(alias) is var m and >= 0 && seen.Add(alias))
                yield return new(alias, m, CompletionGroup.Imported, 0,
                    new CompletionEntry(alias, CompletionCategory.Namespace, alias, replace, Detail: EditingMessages.CompletionImportedSheet(sheet.DisplayName)));
        foreach (var f in BuiltinCatalog.Functions)
            if (Fits(f.Name) is var m and >= 0 && seen.Add(f.Name))
                yield return new(f.Name, m, CompletionGroup.Builtin, 0, new CompletionEntry(f.Name, CompletionCategory.Function, f.Name, replace, Detail: f.Signature,
                    Key: new CompletionKey(CompletionCategory.Function, f.Name)));
        foreach (var c in BuiltinCatalog.Constants.Keys)
            if (Fits(c) is var m and >= 0 && seen.Add(c))
                yield return new(c, m, CompletionGroup.Builtin, 0, new CompletionEntry(c, CompletionCategory.Constant, c, replace, Detail: EditingMessages.CompletionConstant));
        foreach (var candidate in LibraryCandidates(analysis, typed, replace, seen)) yield return candidate;
        foreach (var k in Keywords.All)
            if (Fits(k) is var m and >= 0 && seen.Add(k))
                yield return new(k, m, CompletionGroup.Keyword, 0, new CompletionEntry(k, CompletionCategory.Keyword, k, replace));
    }

    /// <summary>
    /// Names of library sheets the sheet does not import, once three letters of a name's start are
    /// typed: choosing one also adds the <c>use</c> line. A library imported under an alias is left
    /// to <c>alias.</c>, and a name the sheet already has is not offered again.
    /// </summary>
    private static IEnumerable<CompletionCandidate> LibraryCandidates(SheetAnalysis analysis, string typed, TextSpan replace, HashSet<string> seen)
    {
        if (typed.Length < 3) yield break;
        var scope = analysis.Result.Scope;
        var aliased = scope.Namespaces.Values.Select(ns => ns.DisplayName).ToHashSet(StringComparer.Ordinal);
        var edits = new Dictionary<string, Language.Diagnostics.TextEdit>(StringComparer.Ordinal);
        foreach (var name in LibraryIndex.All)
        {
            int match = CompletionMatch.Of(typed, name.Name);
            if (match is not (CompletionMatch.Exact or CompletionMatch.Prefix or CompletionMatch.PrefixOtherCase)) continue;
            // A kind is written only in a function's head, which has a completion of its own.
            if (name.Kind == LibraryNameKind.Kind || aliased.Contains(name.Library) || !seen.Add(name.Name)) continue;
            if (!edits.TryGetValue(name.Library, out var edit)) edits[name.Library] = edit = UseLineEdit.For(analysis.Result.Syntax, name.Library);
            var category = name.Kind switch
            {
                LibraryNameKind.Function => CompletionCategory.Function,
                LibraryNameKind.Table => CompletionCategory.Table,
                LibraryNameKind.Choice => CompletionCategory.Choice,
                LibraryNameKind.Option => CompletionCategory.Option,
                _ => CompletionCategory.Definition,
            };
            yield return new(name.Name, match, CompletionGroup.Library, 0, new CompletionEntry(name.Name, category, name.Name, replace,
                Detail: EditingMessages.CompletionFromLibrary(name.Library), AdditionalEdits: [edit]));
        }
    }

    /// <summary>Where a sheet's own name is declared, as a distance from the cursor; names without a place in this sheet rank between those above and those below.</summary>
    private static int Place(object symbol, SheetAnalysis analysis, int offset) => symbol switch
    {
        DefinitionSymbol d when d.Path == analysis.Path => CompletionRanking.Distance(d.Syntax.Span.Start, offset),
        FunctionSymbol f when f.Home == analysis.Result.Scope => CompletionRanking.Distance(f.Syntax.Span.Start, offset),
        _ => CompletionRanking.Below - 1,
    };

    /// <summary>The members of the sheet imported as <paramref name="alias"/> that fit the typed word.</summary>
    private static CompletionResult Members(SheetScope sheet, string alias, string typed, TextSpan replace) =>
        CompletionRanking.Rank(sheet.OwnSymbols()
            .Select(s => (s.Name, s.Symbol, Match: CompletionMatch.Of(typed, s.Name)))
            .Where(s => s.Match >= 0)
            .Select(s => new CompletionCandidate(s.Name, s.Match, CompletionGroup.Imported, 0, Symbol: s.Symbol)),
            c => Symbol(c.Label, c.Symbol!, replace, alias));

    /// <summary>
    /// An entry for a declared name with what is cheap to say about it. Definitions (whose value
    /// text needs formatting) and anything with a description carry a key for resolving instead.
    /// </summary>
    private static CompletionEntry Symbol(string name, object symbol, TextSpan replace, string? alias) => symbol switch
    {
        DefinitionSymbol => new CompletionEntry(name, CompletionCategory.Definition, name, replace,
            Key: new CompletionKey(CompletionCategory.Definition, name, alias)),
        FunctionSymbol f => new CompletionEntry(name, CompletionCategory.Function, name, replace, Detail: SignatureText.Of(f.Syntax, f.Home.SourceText),
            Key: f.Syntax.Clauses.Description is null ? null : new CompletionKey(CompletionCategory.Function, name, alias)),
        ChoiceOption o => new CompletionEntry(name, CompletionCategory.Option, name, replace, Detail: EditingMessages.CompletionOption(o.Type.Name)),
        TableSymbol => new CompletionEntry(name, CompletionCategory.Table, name, replace, Detail: EditingMessages.CompletionTable),
        ChoiceType => new CompletionEntry(name, CompletionCategory.Choice, name, replace, Detail: EditingMessages.CompletionChoice),
        _ => new CompletionEntry(name, CompletionCategory.Kind, name, replace, Detail: EditingMessages.CompletionKind),
    };

    /// <summary>
    /// After a ':' in a function's head (before the line's first '='): a parameter's or the
    /// return's kind. A ':' after the '=' belongs to a named argument and is left to names.
    /// </summary>
    private static bool IsKindPlace(string before)
    {
        string trimmed = before.TrimEnd();
        return trimmed.EndsWith(':') && !trimmed.Contains('=') && trimmed.Contains('(');
    }

    private static CompletionResult KindNames(SheetAnalysis analysis, string typed, TextSpan replace)
    {
        var scope = analysis.Result.Scope;
        var candidates = new List<CompletionCandidate>();
        void Offer(string name, string? detail, CompletionCategory category, CompletionGroup group)
        {
            if (CompletionMatch.Of(typed, name) is var m and >= 0)
                candidates.Add(new(name, m, group, 0, new CompletionEntry(name, category, name, replace, Detail: detail)));
        }
        foreach (var k in scope.Kinds.Values) Offer(k.Name, k.Description, CompletionCategory.Kind, CompletionGroup.Own);
        foreach (var c in scope.Choices.Values) Offer(c.Name, EditingMessages.CompletionChoice, CompletionCategory.Choice, CompletionGroup.Own);
        foreach (var k in Kinds.Builtin.Where(k => k.AmbiguousWith is null)) Offer(k.Name, k.Description, CompletionCategory.Kind, CompletionGroup.Builtin);
        foreach (var word in new[] { "number", "list", "boolean" }) Offer(word, null, CompletionCategory.Kind, CompletionGroup.Keyword);
        return CompletionRanking.Rank(candidates);
    }

    /// <summary>The last token starting before <paramref name="offset"/>, or -1; tokens are in text order, so a binary search finds it.</summary>
    private static int TokenBefore(IReadOnlyList<SyntaxToken> tokens, int offset)
    {
        int low = 0, high = tokens.Count - 1, found = -1;
        while (low <= high)
        {
            int mid = low + (high - low) / 2;
            if (tokens[mid].Start < offset) { found = mid; low = mid + 1; }
            else high = mid - 1;
        }
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
