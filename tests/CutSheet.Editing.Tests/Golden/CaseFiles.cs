using System.Runtime.CompilerServices;

namespace CutSheet.Editing.Tests.Golden;

/// <summary>The case files in the source tree (not the build output), so that blessing rewrites the files under review.</summary>
public static class CaseFiles
{
    public static string Folder([CallerFilePath] string here = "") => Path.Combine(Path.GetDirectoryName(Path.GetDirectoryName(here)!)!, "Cases");

    public static IEnumerable<object[]> All() =>
        Directory.EnumerateFiles(Folder(), "*.cutsheet", SearchOption.AllDirectories)
            .OrderBy(p => p, StringComparer.Ordinal)
            .Select(p => new object[] { Path.GetRelativePath(Folder(), p).Replace('\\', '/') });

    public static bool Blessing => Environment.GetEnvironmentVariable("CUTSHEET_BLESS") == "1";
}
