namespace CutSheet.Language.Tests.Support;

/// <summary>Finds the repository's folders from the test's output directory.</summary>
public static class RepoPaths
{
    public static string Root { get; } = FindRoot();

    public static string Examples => Path.Combine(Root, "examples");

    public static string TestData(params string[] parts) => Path.Combine([Root, "tests", "CutSheet.Language.Tests", .. parts]);

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "CutSheet.sln"))) dir = dir.Parent;
        return dir?.FullName ?? throw new InvalidOperationException("CutSheet.sln not found above " + AppContext.BaseDirectory);
    }
}
