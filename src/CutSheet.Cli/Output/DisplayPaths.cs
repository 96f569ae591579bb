namespace CutSheet.Cli.Output;

/// <summary>How file paths are shown: relative to the working directory when inside it, else in full.</summary>
internal static class DisplayPaths
{
    public static string ForUser(string fullPath, string workingDirectory)
    {
        string? relative = RelativeInside(fullPath, workingDirectory);
        return relative ?? fullPath;
    }

    /// <summary>The path relative to <paramref name="workingDirectory"/>, or null when the file lies outside it.</summary>
    public static string? RelativeInside(string fullPath, string workingDirectory)
    {
        string relative = Path.GetRelativePath(workingDirectory, fullPath);
        bool outside = Path.IsPathRooted(relative)
            || relative == ".."
            || relative.StartsWith(".." + Path.DirectorySeparatorChar, StringComparison.Ordinal)
            || relative.StartsWith("../", StringComparison.Ordinal);
        return outside ? null : relative;
    }

    /// <summary>A path with forward slashes, as URIs and SARIF want it.</summary>
    public static string WithForwardSlashes(string path) =>
        Path.DirectorySeparatorChar == '/' ? path : path.Replace(Path.DirectorySeparatorChar, '/');
}
