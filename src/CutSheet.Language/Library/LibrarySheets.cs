using System.Reflection;

namespace CutSheet.Language.Library;

/// <summary>
/// The library sheets shipped inside the tool (embedded <c>Library/*.cutsheet</c> files),
/// versioned with it. <c>use NAME</c> loads them.
/// </summary>
public static class LibrarySheets
{
    private const string ResourcePrefix = "CutSheet.Language.Library.";

    /// <summary>The label that stands for a library sheet's path in diagnostics: <c>library/NAME.cutsheet</c>.</summary>
    public static string PathOf(string name) => $"library/{name}.cutsheet";

    /// <summary>The library version: the tool's version, since the sheets ship with it.</summary>
    public static string Version => typeof(LibrarySheets).Assembly.GetName().Version?.ToString(3) ?? "0.0.0";

    public static IReadOnlyList<string> Names { get; } = typeof(LibrarySheets).Assembly.GetManifestResourceNames()
        .Where(n => n.StartsWith(ResourcePrefix, StringComparison.Ordinal) && n.EndsWith(".cutsheet", StringComparison.Ordinal))
        .Select(n => n[ResourcePrefix.Length..^".cutsheet".Length])
        .OrderBy(n => n, StringComparer.Ordinal)
        .ToArray();

    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, Syntax.SheetSyntax?> Parsed = new(StringComparer.Ordinal);

    /// <summary>
    /// The parsed library sheet, parsed once per process: syntax is immutable and the sheets ship
    /// with the tool, so every <c>use</c> of a library sheet shares one tree.
    /// </summary>
    public static Syntax.SheetSyntax? Syntax(string name) =>
        Parsed.GetOrAdd(name, n => Read(n) is { } text ? CutSheet.Language.Syntax.SheetSyntax.Parse(text, PathOf(n)) : null);

    public static string? Read(string name)
    {
        using var stream = typeof(LibrarySheets).Assembly.GetManifestResourceStream(ResourcePrefix + name + ".cutsheet");
        if (stream is null) return null;
        using var reader = new StreamReader(stream);
        return reader.ReadToEnd();
    }
}
