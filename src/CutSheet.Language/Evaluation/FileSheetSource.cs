namespace CutSheet.Language.Evaluation;

/// <summary>Reads imported sheets from disk.</summary>
public sealed class FileSheetSource : ISheetSource
{
    public static readonly FileSheetSource Instance = new();

    public string? Read(string fullPath)
    {
        try
        {
            return File.Exists(fullPath) ? File.ReadAllText(fullPath) : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    public string ResolveLinks(string fullPath)
    {
        try
        {
            var parts = Path.GetFullPath(fullPath);
            var info = new FileInfo(parts);
            var target = info.ResolveLinkTarget(returnFinalTarget: true);
            string resolved = target?.FullName ?? parts;
            string? dir = Path.GetDirectoryName(resolved);
            if (dir is null) return resolved;
            var dirTarget = new DirectoryInfo(dir).ResolveLinkTarget(returnFinalTarget: true);
            return dirTarget is null ? ResolveDirectory(dir, Path.GetFileName(resolved)) : Path.Combine(dirTarget.FullName, Path.GetFileName(resolved));
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException or ArgumentException)
        {
            return Path.GetFullPath(fullPath);
        }
    }

    private static string ResolveDirectory(string dir, string file)
    {
        // Resolve links in every ancestor directory so that a linked folder cannot lead outside the workspace.
        var current = new DirectoryInfo(dir);
        var stack = new Stack<string>();
        stack.Push(file);
        while (current is not null)
        {
            var target = current.ResolveLinkTarget(returnFinalTarget: true);
            if (target is not null)
            {
                string rebuilt = target.FullName;
                while (stack.Count > 0) rebuilt = Path.Combine(rebuilt, stack.Pop());
                return rebuilt;
            }
            stack.Push(current.Name);
            current = current.Parent;
        }
        return Path.Combine(dir, file);
    }
}
