namespace CutSheet.Language.Tests.Checks;

/// <summary>Checks and cautions, one case per line of <c>Cases/checks.cases</c>; expected values are worked by hand there.</summary>
public class CheckSemanticsTests
{
    public static TheoryData<string> Cases => new(CheckCaseFile.Load().Select(c => c.Where));

    [Theory, MemberData(nameof(Cases))]
    public void Holds(string where) => CheckCaseRunner.Run(CheckCaseFile.Load().Single(c => c.Where == where));

    /// <summary>The case file is read in full: a line the loader skipped would be a test that cannot fail.</summary>
    [Fact]
    public void EveryCaseLineIsLoaded()
    {
        int lines = File.ReadLines(Support.RepoPaths.TestData("Cases", CheckCaseFile.FileName))
            .Count(l => l.Trim().Length > 0 && !l.TrimStart().StartsWith('#'));
        Assert.Equal(lines, CheckCaseFile.Load().Count);
    }
}
