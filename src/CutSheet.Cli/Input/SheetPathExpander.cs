namespace CutSheet.Cli.Input;

/// <summary>
/// Turns the PATH arguments of <c>check</c> into sheet files: a file stands for itself, a directory
/// for every <c>*.cutsheet</c> below it. The result is sorted ordinally and free of duplicates, so the
/// same tree gives the same output on every machine.
/// </summary>
internal static class SheetPathExpander
{
    public const string Extension = ".cutsheet";

    private static readonly EnumerationOptions Recursive = new()
    {
        RecurseSubdirectories = true,
        MatchType = MatchType.Simple,
        MatchCasing = MatchCasing.CaseSensitive,
        // "Every *.cutsheet" means every one; the default would skip hidden files and folders.
        AttributesToSkip = 0,
        IgnoreInaccessible = false,
    };

    public static IReadOnlyList<string> Expand(IEnumerable<string> paths, string workingDirectory)
    {
        var files = new SortedSet<string>(StringComparer.Ordinal);
        foreach (string given in paths)
        {
            if (string.IsNullOrWhiteSpace(given)) throw new CliUsageException("empty path");
            string full = Path.GetFullPath(given, workingDirectory);
            if (File.Exists(full))
            {
                files.Add(full);
            }
            else if (Directory.Exists(full))
            {
                var found = FindSheets(given, full);
                if (found.Count == 0) throw new CliUsageException($"{given}: no *{Extension} files in this directory");
                files.UnionWith(found);
            }
            else
            {
                throw new CliUsageException($"{given}: no such file or directory");
            }
        }
        return files.ToList();
    }

    private static List<string> FindSheets(string given, string directory)
    {
        try
        {
            return Directory.EnumerateFiles(directory, "*" + Extension, Recursive)
                .Where(f => f.EndsWith(Extension, StringComparison.Ordinal))
                .Select(Path.GetFullPath)
                .ToList();
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new CliUsageException($"{given}: cannot read directory: {e.Message}");
        }
    }
}
