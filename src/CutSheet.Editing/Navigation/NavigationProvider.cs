using CutSheet.Editing.Analysis;
using CutSheet.Editing.Symbols;

namespace CutSheet.Editing.Navigation;

/// <summary>
/// Go to definition and find references. References are looked for in every sheet given
/// (the editor's open sheets): a sheet that imports another refers to the other's names by
/// the same declaration, so one key finds them all.
/// </summary>
public static class NavigationProvider
{
    public static SheetLocation? Definition(SheetAnalysis analysis, int offset)
    {
        if (analysis.Index.At(offset) is not { } occurrence || occurrence.Target.IsBuiltin) return null;
        var target = occurrence.Target;
        return target.Category == SymbolCategory.Sheet
            ? new SheetLocation(target.Path, default, null)
            : new SheetLocation(target.Path, target.Declaration, target.HomeText);
    }

    public static IReadOnlyList<SheetLocation> References(SheetAnalysis analysis, IEnumerable<SheetAnalysis> openSheets, int offset, bool includeDeclaration)
    {
        if (analysis.Index.At(offset) is not { } occurrence || occurrence.Target.Category == SymbolCategory.Sheet) return [];
        var key = occurrence.Target.Key;
        var found = new List<SheetLocation>();
        var seen = new HashSet<(string?, int)>();
        foreach (var sheet in openSheets.Prepend(analysis).DistinctBy(s => s.Path ?? "\0untitled"))
        {
            foreach (var o in sheet.Index.Of(key))
            {
                if (o.IsDeclaration && !includeDeclaration) continue;
                if (seen.Add((sheet.Path, o.Span.Start))) found.Add(new SheetLocation(sheet.Path, o.Span, sheet.Source));
            }
        }
        var target = occurrence.Target;
        if (includeDeclaration && !target.IsBuiltin && seen.Add((target.Path, target.Declaration.Start)))
            found.Insert(0, new SheetLocation(target.Path, target.Declaration, target.HomeText));
        return found;
    }
}
