using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Checks;

/// <summary>
/// Reads <c>Cases/checks.cases</c>: <c>SHEET ⇶ EXPECTATION | EXPECTATION …  // working</c>. The
/// sheet's statements are separated by <c>"; "</c> as in the other case files, but nothing is
/// added to them: the last statement is a check or a caution itself.
/// </summary>
public static class CheckCaseFile
{
    public const string FileName = "checks.cases";

    public static IReadOnlyList<CheckCase> Load()
    {
        var cases = new List<CheckCase>();
        int lineNumber = 0;
        foreach (var raw in File.ReadLines(RepoPaths.TestData("Cases", FileName)))
        {
            lineNumber++;
            string line = raw.Trim();
            if (line.Length == 0 || line.StartsWith('#')) continue;
            int arrow = line.IndexOf(CaseFile.Arrow, StringComparison.Ordinal);
            if (arrow < 0) throw new FormatException($"{FileName}:{lineNumber}: no {CaseFile.Arrow} in '{line}'");
            string sheet = string.Join("\n", line[..arrow].Trim().Split("; ")) + "\n";
            string rest = line[(arrow + CaseFile.Arrow.Length)..];
            int comment = rest.IndexOf("//", StringComparison.Ordinal);
            string expected = (comment >= 0 ? rest[..comment] : rest).Trim();
            string source = comment >= 0 ? rest[(comment + 2)..].Trim() : "";
            var expectations = expected.Split(" | ", StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries);
            cases.Add(new CheckCase($"{FileName}:{lineNumber}", sheet, expectations, source));
        }
        return cases;
    }
}
