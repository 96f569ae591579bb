using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Symbols;

/// <summary>
/// Finds where a choice, an option or a declared kind is written. The language's symbols for
/// these carry no span, so the declaring sheet's text (kept on its scope) is parsed again;
/// parsing is cheap and never throws.
/// </summary>
internal static class DeclarationFinder
{
    public static SymbolTarget? Choice(SheetScope home, ChoiceType choice) =>
        Statements(home).OfType<ChoiceSyntax>().FirstOrDefault(c => c.Name == choice.Name) is { } c
            ? new SymbolTarget(c.Name, SymbolCategory.Choice, home.Path, c.NameSpan, choice) { HomeText = home.SourceText }
            : null;

    public static SymbolTarget? Option(SheetScope home, ChoiceOption option)
    {
        foreach (var c in Statements(home).OfType<ChoiceSyntax>().Where(c => c.Name == option.Type.Name))
            foreach (var (name, span) in c.Options)
                if (name == option.Name) return new SymbolTarget(name, SymbolCategory.Option, home.Path, span, option) { HomeText = home.SourceText };
        return null;
    }

    public static SymbolTarget? Kind(SheetScope home, Kind kind) =>
        Statements(home).OfType<KindDeclarationSyntax>().FirstOrDefault(k => k.Name == kind.Name) is { } k
            ? new SymbolTarget(k.Name, SymbolCategory.Kind, home.Path, k.NameSpan, kind) { HomeText = home.SourceText }
            : new SymbolTarget(kind.Name, SymbolCategory.BuiltinKind, null, default, kind);

    private static IReadOnlyList<StatementSyntax> Statements(SheetScope home) =>
        home.SourceText is { } text ? SheetSyntax.Parse(text).Statements : [];
}
