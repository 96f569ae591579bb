namespace CutSheet.Editing.Symbols;

/// <summary>The label the language gives library sheets in place of a path (<c>library/NAME.cutsheet</c>).</summary>
public static class LibraryPaths
{
    public const string Prefix = "library/";

    public static bool IsLibrary(string? path) => path is not null && path.StartsWith(Prefix, StringComparison.Ordinal);

    /// <summary>The library sheet's name from its label, or null.</summary>
    public static string? NameOf(string? path) =>
        IsLibrary(path) && path!.EndsWith(".cutsheet", StringComparison.Ordinal) ? path[Prefix.Length..^".cutsheet".Length] : null;
}
