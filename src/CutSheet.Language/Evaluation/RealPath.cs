namespace CutSheet.Language.Evaluation;

/// <summary>
/// A path with every link along it resolved, component by component, as the system's realpath
/// does: two paths name the same file exactly when their real paths are equal. Imports are
/// confined to the workspace by their real paths, and <c>cutsheet check</c> takes each sheet once
/// by it. Written here because .NET resolves only a path's last component, and portably.
/// </summary>
public static class RealPath
{
    /// <summary>As many links as the system follows before it gives up on a path (Linux's limit).</summary>
    private const int MaxLinks = 40;

    /// <summary>
    /// The real path of <paramref name="path"/> (taken from the current folder when relative). As the
    /// system does, <c>..</c> goes up from where the links before it lead, not from the text before
    /// it; a path through more than <see cref="MaxLinks"/> links is returned as far as resolved.
    /// </summary>
    public static string Of(string path)
    {
        int links = 0;
        return Resolve(Path.IsPathRooted(path) ? path : Path.Combine(Directory.GetCurrentDirectory(), path), ref links);
    }

    private static string Resolve(string absolute, ref int links)
    {
        string root = Path.GetPathRoot(absolute) ?? "";
        string current = root;
        foreach (string part in absolute[root.Length..].Split(Path.DirectorySeparatorChar, Path.AltDirectorySeparatorChar, StringSplitOptions.RemoveEmptyEntries))
        {
            if (part == ".") continue;
            if (part == "..")
            {
                current = Path.GetDirectoryName(current) ?? root;
                continue;
            }
            string next = Path.Join(current, part);
            string? target = LinkTarget(next);
            if (target is not null && links < MaxLinks)
            {
                links++;
                // A relative target is read from the folder the link sits in, which is already real.
                next = Resolve(Path.IsPathRooted(target) ? target : Path.Join(current, target), ref links);
            }
            current = next;
        }
        return current.Length == 0 ? root : current;
    }

    private static string? LinkTarget(string path)
    {
        try
        {
            var info = new FileInfo(path);
            return info.Exists || Directory.Exists(path) ? info.LinkTarget : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            return null;
        }
    }
}
