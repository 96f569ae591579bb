namespace CutSheet.Editing.Tests.Golden;

/// <summary>
/// Golden tests of the editing features: each case file's output must equal its
/// <c>.expected</c> file. <c>CUTSHEET_BLESS=1 dotnet test tests/CutSheet.Editing.Tests</c> rewrites
/// the expected files; read every changed one before committing it (the values must be right,
/// not merely what the code does).
/// </summary>
public sealed class GoldenTests
{
    [Theory]
    [MemberData(nameof(CaseFiles.All), MemberType = typeof(CaseFiles))]
    public void Case(string relativePath)
    {
        var c = GoldenCase.Load(Path.Combine(CaseFiles.Folder(), relativePath));
        string actual = GoldenRenderer.Render(c).Replace("\r\n", "\n");
        if (CaseFiles.Blessing)
        {
            File.WriteAllText(c.ExpectedPath, actual);
            return;
        }
        Assert.True(File.Exists(c.ExpectedPath), $"{c}: no expected file; run with CUTSHEET_BLESS=1 and review it. Output:\n{actual}");
        Assert.Equal(File.ReadAllText(c.ExpectedPath).Replace("\r\n", "\n"), actual);
    }
}
