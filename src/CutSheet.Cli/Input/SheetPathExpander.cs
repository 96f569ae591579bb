using CutSheet.Language.Evaluation;

namespace CutSheet.Cli.Input;

/// <summary>
/// Turns the PATH arguments of <c>check</c> into sheet files: a file stands for itself, a directory
/// for every <c>*.cutsheet</c> below it. The result is sorted ordinally and free of duplicates, so the
/// same tree gives the same output on every machine.
/// </summary>
internal static class SheetPathExpander
{
    public const string Extension = ".cutsheet";

    /// <summary>One folder at a time: the walk follows linked folders itself, so that it can visit each folder once.</summary>
    private static readonly EnumerationOptions OneLevel = new()
    {
        RecurseSubdirectories = false,
        MatchType = MatchType.Simple,
        MatchCasing = MatchCasing.CaseSensitive,
        // "Every *.cutsheet" means every one; the default would skip hidden files and folders.
        AttributesToSkip = 0,
        IgnoreInaccessible = false,
    };

    public static IReadOnlyList<string> Expand(IEnumerable<string> paths, string workingDirectory)
    {
        var files = new SortedSet<string>(StringComparer.Ordinal);
        // A sheet reached again through another PATH (and a link) is taken once, by its first path.
        var taken = new HashSet<string>(StringComparer.Ordinal);
        foreach (string given in paths)
        {
            if (string.IsNullOrWhiteSpace(given)) throw new CliUsageException("empty path");
            string full = Path.GetFullPath(given, workingDirectory);
            if (File.Exists(full))
            {
                if (taken.Add(Resolved(new FileInfo(full), null))) files.Add(full);
            }
            else if (Directory.Exists(full))
            {
                var found = FindSheets(given, full);
                if (found.Count == 0) throw new CliUsageException($"{given}: no *{Extension} files in this directory");
                foreach (var (path, resolved) in found) if (taken.Add(resolved)) files.Add(path);
            }
            else
            {
                throw new CliUsageException($"{given}: no such file or directory");
            }
        }
        return files.ToList();
    }

    /// <summary>
    /// Every sheet below <paramref name="directory"/>. Linked folders are followed, but each folder
    /// and each sheet is taken once, by the path its links resolve to: a link back up the tree (or
    /// two links to one folder) would otherwise list the same sheets again and again. Linked
    /// folders wait until every folder reachable without a link is done, so that a sheet keeps its
    /// own path rather than one through a link.
    /// </summary>
    private static List<(string Path, string Resolved)> FindSheets(string given, string directory)
    {
        var found = new List<(string, string)>();
        var folders = new HashSet<string>(StringComparer.Ordinal);
        var sheets = new HashSet<string>(StringComparer.Ordinal);
        var pending = new Stack<(string Path, string Resolved)>();
        var linked = new Stack<(string Path, string Resolved)>();
        try
        {
            pending.Push((directory, Resolved(new DirectoryInfo(directory), null)));
            while (pending.Count > 0 || linked.Count > 0)
            {
                var (folder, resolved) = pending.Count > 0 ? pending.Pop() : linked.Pop();
                if (!folders.Add(resolved)) continue;
                foreach (string file in Directory.EnumerateFiles(folder, "*" + Extension, OneLevel).Order(StringComparer.Ordinal))
                {
                    if (!file.EndsWith(Extension, StringComparison.Ordinal)) continue;
                    string sheet = Resolved(new FileInfo(file), resolved);
                    if (sheets.Add(sheet)) found.Add((Path.GetFullPath(file), sheet));
                }
                // Pushed in reverse, so that folders are walked in name order.
                foreach (string sub in Directory.EnumerateDirectories(folder, "*", OneLevel).Order(StringComparer.Ordinal).Reverse())
                {
                    var info = new DirectoryInfo(sub);
                    (info.LinkTarget is null ? pending : linked).Push((sub, Resolved(info, resolved)));
                }
            }
            return found;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            throw new CliUsageException($"{given}: cannot read directory: {e.Message}");
        }
    }

    /// <summary>The path an entry's links resolve to (its folder's resolved path when known, joined with its name).</summary>
    private static string Resolved(FileSystemInfo entry, string? resolvedFolder) =>
        resolvedFolder is null ? RealPath.Of(entry.FullName) : RealPath.Of(Path.Join(resolvedFolder, entry.Name));
}
