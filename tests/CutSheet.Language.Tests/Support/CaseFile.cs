namespace CutSheet.Language.Tests.Support;

/// <summary>
/// One-line test cases in text files: <c>INPUT ⇶ EXPECTED  // source</c>. Lines starting with
/// <c>#</c> are comments; <c>; </c> separates statements written before the last expression.
/// </summary>
public static class CaseFile
{
    public const string Arrow = "⇶";

    public static IEnumerable<object[]> Load(string fileName)
    {
        string path = RepoPaths.TestData("Cases", fileName);
        int lineNumber = 0;
        foreach (var raw in File.ReadLines(path))
        {
            lineNumber++;
            string line = raw.Trim();
            if (line.Length == 0 || line.StartsWith('#')) continue;
            int arrow = line.IndexOf(Arrow, StringComparison.Ordinal);
            if (arrow < 0) throw new FormatException($"{fileName}:{lineNumber}: no {Arrow} in '{line}'");
            string input = line[..arrow].Trim();
            string rest = line[(arrow + Arrow.Length)..];
            int comment = rest.IndexOf("//", StringComparison.Ordinal);
            string expected = (comment >= 0 ? rest[..comment] : rest).Trim();
            string source = comment >= 0 ? rest[(comment + 2)..].Trim() : "";
            yield return [$"{fileName}:{lineNumber}", input, expected, source];
        }
    }
}
