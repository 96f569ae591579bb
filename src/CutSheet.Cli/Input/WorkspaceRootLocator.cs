namespace CutSheet.Cli.Input;

/// <summary>
/// Chooses the directory that <c>use "path"</c> imports are confined to: the <c>--workspace</c> option when
/// given, else the nearest ancestor of the sheet holding a <c>.git</c> entry (the repository the sheet lives
/// in), else the sheet's own directory.
/// </summary>
internal static class WorkspaceRootLocator
{
    /// <summary>Validates and resolves the <c>--workspace</c> option; null when it was not given.</summary>
    public static string? FromOption(string? option, string workingDirectory)
    {
        if (option is null) return null;
        if (option.Trim().Length == 0) throw new CliUsageException("--workspace: empty directory name");
        string full = Path.TrimEndingDirectorySeparator(Path.GetFullPath(option, workingDirectory));
        if (!Directory.Exists(full)) throw new CliUsageException($"--workspace: {option}: no such directory");
        return full;
    }

    public static string Locate(string sheetFullPath, string? explicitRoot)
    {
        if (explicitRoot is not null) return explicitRoot;
        string sheetDirectory = Path.GetDirectoryName(sheetFullPath) ?? sheetFullPath;
        for (var dir = new DirectoryInfo(sheetDirectory); dir is not null; dir = dir.Parent)
        {
            string git = Path.Combine(dir.FullName, ".git");
            // A .git *file* marks a worktree or submodule checkout; it is as much a repository root as a .git folder.
            if (Directory.Exists(git) || File.Exists(git)) return Path.TrimEndingDirectorySeparator(dir.FullName);
        }
        return sheetDirectory;
    }
}
