namespace CutSheet.UnitCatalogGenerator;

public static class RepoRoot
{
    /// <summary>The nearest folder at or above <paramref name="start"/> holding CutSheet.sln.</summary>
    public static string? Find(string start)
    {
        for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "CutSheet.sln"))) return dir.FullName;
        return null;
    }

    /// <summary>File text with CRLF folded to LF, so a Windows checkout (autocrlf) is not "stale".</summary>
    public static string ReadNormalized(string path) => File.ReadAllText(path).Replace("\r\n", "\n");
}
