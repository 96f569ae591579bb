using CutSheet.Editing.Analysis;
using CutSheet.Editing.Symbols;
using CutSheet.Language.Syntax;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Navigation;

/// <summary>
/// Rename a name of the sheet everywhere it is known: its declaration, its references, named
/// arguments for parameters, and the open sheets that import it. Built-ins, library names and
/// sheet paths are refused, and so is a new name that is not a name or is taken.
/// </summary>
public static class RenameProvider
{
    /// <summary>The span to rename and its current text, or the reason it cannot be renamed.</summary>
    public static (TextSpan Span, string Name)? Prepare(SheetAnalysis analysis, int offset, out string? refusal)
    {
        refusal = null;
        var occurrence = analysis.Index.At(offset);
        refusal = occurrence is null ? EditingMessages.NothingToRename : Refusal(occurrence.Target);
        return refusal is null ? (occurrence!.Span, analysis.Source.Slice(occurrence.Span)) : null;
    }

    public static IReadOnlyList<SheetEdit>? Rename(SheetAnalysis analysis, IEnumerable<SheetAnalysis> openSheets, int offset, string newName, out string? refusal)
    {
        if (Prepare(analysis, offset, out refusal) is null) return null;
        var target = analysis.Index.At(offset)!.Target;
        refusal = CheckName(newName);
        if (refusal is not null) return null;
        var sheets = openSheets.Prepend(analysis).DistinctBy(s => s.Path ?? "\0untitled").ToList();
        if (newName == target.Name) return [];

        var edits = new List<SheetEdit>();
        foreach (var sheet in sheets)
        {
            var occurrences = sheet.Index.Of(target.Key).ToList();
            if (occurrences.Count == 0) continue;
            if (IsTaken(sheet, target, newName))
            {
                refusal = EditingMessages.AlreadyNamed(newName, sheet.Path is null ? "this sheet" : System.IO.Path.GetFileName(sheet.Path));
                return null;
            }
            edits.AddRange(occurrences.Select(o => new SheetEdit(sheet.Path, o.Span, newName, sheet.Source)));
        }
        // A declaration in a sheet that is not open is renamed in the text the evaluation read.
        if (!sheets.Any(s => s.Path == target.Path) && target.HomeText is not null)
            edits.Add(new SheetEdit(target.Path, target.Declaration, newName, target.HomeText));
        return edits;
    }

    private static string? Refusal(SymbolTarget target) =>
        target.IsBuiltin ? EditingMessages.BuiltinNotRenamed
        : target.IsInLibrary ? EditingMessages.LibraryNotRenamed
        : target.Category == SymbolCategory.Sheet ? EditingMessages.SheetNotRenamed
        : null;

    private static string? CheckName(string name)
    {
        if (name.Length == 0 || !(char.IsLetter(name[0]) || name[0] == '_') || !name.All(c => char.IsLetterOrDigit(c) || c == '_' || c == '\'' || c == '′') || name.Contains('µ'))
            return EditingMessages.NotAName(name);
        if (Keywords.TryGet(name, out _)) return EditingMessages.Reserved(name);
        return null;
    }

    /// <summary>True when the new name would collide with another name visible in the sheet.</summary>
    private static bool IsTaken(SheetAnalysis sheet, SymbolTarget target, string newName)
    {
        if (target.Category is SymbolCategory.Parameter or SymbolCategory.Local)
            return sheet.Index.Occurrences.Any(o => o.IsDeclaration && o.Target.Category is SymbolCategory.Parameter or SymbolCategory.Local && o.Target.Name == newName
                && SameStatement(sheet, o.Span.Start, target.Declaration.Start))
                || sheet.Result.Scope.Find(newName) is not null;
        if (target.Category == SymbolCategory.Namespace) return sheet.Result.Scope.Namespaces.ContainsKey(newName);
        return sheet.Result.Scope.Find(newName) is not null;
    }

    private static bool SameStatement(SheetAnalysis sheet, int a, int b) =>
        sheet.Result.Syntax.Statements.Any(s => s.Span.Contains(a) && s.Span.Contains(b));
}
