using CutSheet.Editing.Analysis;
using CutSheet.Editing.Signatures;
using CutSheet.Editing.Values;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Completion;

/// <summary>
/// The details of one completion, found again by its <see cref="CompletionKey"/> when the editor
/// shows that completion: a definition's value as the sheet shows it, a function's or unit's
/// description. Completion lists leave these out because formatting them for every name of a
/// large sheet costs more than the rest of the list.
/// </summary>
public static class CompletionResolver
{
    /// <summary>
    /// The details for <paramref name="key"/> in <paramref name="analysis"/>, or null when the
    /// name is no longer there (the sheet changed since the list was made) or has none.
    /// </summary>
    public static CompletionDetails? Resolve(SheetAnalysis analysis, CompletionKey key)
    {
        if (key.Category == CompletionCategory.Unit)
            return UnitCatalog.Default.FindSymbol(key.Name) is { } unit ? new CompletionDetails(unit.Name, unit.Note) : null;

        var scope = analysis.Result.Scope;
        if (key.Alias is not null && !scope.Namespaces.TryGetValue(key.Alias, out scope)) return null;
        var symbol = key.Alias is null ? scope.Find(key.Name) : scope.FindOwn(key.Name);
        int digits = analysis.Result.Display.Digits;
        return (key.Category, symbol) switch
        {
            (CompletionCategory.Definition, DefinitionSymbol d) => new CompletionDetails(Value(analysis, d, digits), d.Syntax.Clauses.Description?.Value),
            (CompletionCategory.Function, FunctionSymbol f) => new CompletionDetails(SignatureText.Of(f.Syntax, f.Home.SourceText), f.Syntax.Clauses.Description?.Value),
            (CompletionCategory.Function, null) => Builtin(key.Name),
            _ => null,
        };
    }

    private static CompletionDetails? Builtin(string name)
    {
        foreach (var f in BuiltinCatalog.Functions)
            if (f.Name == name) return new CompletionDetails(f.Signature, f.Description);
        return null;
    }

    /// <summary>
    /// A definition of this sheet shows the value this evaluation displays (its own unit and
    /// digits); one of another sheet shows its value through the language's symbol.
    /// </summary>
    private static string? Value(SheetAnalysis analysis, DefinitionSymbol d, int digits)
    {
        if (analysis.Result.Scope.Definitions.GetValueOrDefault(d.Name) != d) return ValueText.Of(d, digits);
        var statements = analysis.Result.Statements;
        // The symbol's statement index is usually the result's index too; a scan is the fallback.
        var result = d.StatementIndex < statements.Count && statements[d.StatementIndex] is DefinitionResult r && r.Definition == d.Syntax
            ? r
            : analysis.Result.Definitions.FirstOrDefault(x => x.Definition == d.Syntax);
        return result is null ? ValueText.Of(d, digits) : result.Value?.Text;
    }
}
