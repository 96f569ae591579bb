using CutSheet.Language.Text;

namespace CutSheet.Editing.Symbols;

/// <summary>
/// What an occurrence of a name refers to: its declaration in the sheet at <see cref="Path"/>
/// (null: a sheet without a file; built-ins have no declaration). Two occurrences refer to
/// the same thing exactly when their <see cref="Key"/>s are equal, across sheets too.
/// <see cref="Symbol"/> is the language's symbol object when there is one (for hover).
/// </summary>
public sealed record SymbolTarget(string Name, SymbolCategory Category, string? Path, TextSpan Declaration, object? Symbol = null)
{
    /// <summary>The text of the declaring sheet as the evaluation read it (spans refer to it), when known.</summary>
    public SourceText? HomeText { get; init; }

    public bool IsBuiltin => Category is SymbolCategory.BuiltinFunction or SymbolCategory.BuiltinConstant or SymbolCategory.BuiltinKind;

    /// <summary>Library sheets ship with the tool: their names can be read but never renamed.</summary>
    public bool IsInLibrary => Path is not null && Path.StartsWith(LibraryPaths.Prefix, StringComparison.Ordinal);

    public SymbolKey Key => new(Category, Path, IsBuiltin ? -1 : Declaration.Start, IsBuiltin ? Name : null);
}

/// <summary>The identity of a declaration.</summary>
public readonly record struct SymbolKey(SymbolCategory Category, string? Path, int Start, string? BuiltinName);
