namespace CutSheet.Cli.Tests.Support;

/// <summary>The test sheets, copied next to the test assembly.</summary>
public static class Sheets
{
    public static string Directory => Path.Combine(AppContext.BaseDirectory, "Sheets");

    public static string PathOf(string relative) => Path.Combine(Directory, relative);
}
