using CutSheet.Editing.Analysis;
using CutSheet.Editing.Symbols;
using CutSheet.Language.Syntax;

namespace CutSheet.Editing.Highlighting;

/// <summary>Colours from the tokens, and for names from what they refer to (a definition, a function, a kind…).</summary>
public static class HighlightProvider
{
    public static IReadOnlyList<HighlightSpan> Highlight(SheetAnalysis analysis)
    {
        var occurrences = analysis.Index.Occurrences.GroupBy(o => o.Span.Start).ToDictionary(g => g.Key, g => g.First());
        var spans = new List<HighlightSpan>();
        foreach (var token in analysis.Result.Syntax.Tokens)
        {
            // A name the language reads as something else (the alias in 'use … as s' is lexed as a unit) is still a name.
            HighlightSpan? span = occurrences.ContainsKey(token.Start) ? Name(token, occurrences) : token.Kind switch
            {
                TokenKind.Comment => new(token.Span, HighlightCategory.Comment),
                TokenKind.Heading => new(token.Span, HighlightCategory.Heading),
                TokenKind.Number => new(token.Span, HighlightCategory.Number),
                TokenKind.Unit => new(token.Span, HighlightCategory.Unit),
                TokenKind.String => new(token.Span, HighlightCategory.String),
                TokenKind.Identifier => Name(token, occurrences),
                TokenKind.True or TokenKind.False => new(token.Span, HighlightCategory.Keyword),
                _ when Keywords.IsKeyword(token.Kind) => new(token.Span, HighlightCategory.Keyword),
                >= TokenKind.Plus and <= TokenKind.PlusMinus => new(token.Span, HighlightCategory.Operator),
                _ => null,
            };
            if (span is not null && token.Length > 0) spans.Add(span);
        }
        return spans;
    }

    private static HighlightSpan Name(SyntaxToken token, Dictionary<int, SymbolOccurrence> occurrences)
    {
        if (!occurrences.TryGetValue(token.Start, out var o)) return new(token.Span, HighlightCategory.Definition);
        var modifiers = (o.IsDeclaration ? HighlightModifiers.Declaration : 0)
            | (o.Target.IsBuiltin ? HighlightModifiers.Builtin : 0)
            | (o.Target.IsInLibrary ? HighlightModifiers.Library : 0);
        var category = o.Target.Category switch
        {
            SymbolCategory.Function or SymbolCategory.BuiltinFunction => HighlightCategory.Function,
            SymbolCategory.Parameter => HighlightCategory.Parameter,
            SymbolCategory.Local => HighlightCategory.Local,
            SymbolCategory.Choice => HighlightCategory.Choice,
            SymbolCategory.Option => HighlightCategory.Option,
            SymbolCategory.Table => HighlightCategory.Table,
            SymbolCategory.Kind or SymbolCategory.BuiltinKind => HighlightCategory.Kind,
            SymbolCategory.Namespace or SymbolCategory.Sheet => HighlightCategory.Namespace,
            SymbolCategory.BuiltinConstant => HighlightCategory.Constant,
            _ => HighlightCategory.Definition,
        };
        return new(token.Span, category, modifiers);
    }
}
