using System.Globalization;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Results;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests;

/// <summary>
/// Whole sheets with their expectations written inline: a statement whose description holds
/// <c>⇒ EXPECTED</c> must show that value (<c>NUMBER UNIT</c>, <c>true</c>, <c>unknown</c>) and
/// raise the codes listed (<c>CUTnnnn</c>) on its own lines. Any error that no line expects fails
/// the test. Each expectation names its source after it.
/// </summary>
public class SheetCaseTests
{
    public static IEnumerable<object[]> Sheets() =>
        Directory.EnumerateFiles(RepoPaths.TestData("Cases", "sheets"), "*.cutsheet", SearchOption.TopDirectoryOnly)
            .Order(StringComparer.Ordinal).Select(p => new object[] { Path.GetFileName(p) });

    [Theory, MemberData(nameof(Sheets))]
    public void SheetMeetsItsExpectations(string file)
    {
        string path = RepoPaths.TestData("Cases", "sheets", file);
        var result = SheetRunner.Run(File.ReadAllText(path), path);
        var source = result.Syntax.Source;
        var expectedCodes = new List<(int FirstLine, int LastLine, string Code)>();
        int checkedCount = 0;
        foreach (var statement in result.Statements)
        {
            string? description = statement.Syntax.Clauses.Description?.Value;
            if (description is null) continue;
            int arrow = description.IndexOf('⇒');
            if (arrow < 0) continue;
            int firstLine = source.GetPosition(statement.Span.Start).Line;
            int lastLine = source.GetPosition(statement.Span.End).Line;
            var tokens = Expectation(description[(arrow + 1)..]);
            foreach (var code in tokens.Where(t => t.StartsWith("CUT", StringComparison.Ordinal)))
            {
                expectedCodes.Add((firstLine, lastLine, code));
                Assert.True(result.Diagnostics.Any(d => d.Code == code && d.Path is null && Within(source.GetPosition(d.Span.Start).Line, firstLine, lastLine)),
                    $"{file}:{firstLine + 1}: expected {code}; got {Describe(result, firstLine, lastLine)}");
            }
            var values = tokens.Where(t => !t.StartsWith("CUT", StringComparison.Ordinal)).ToList();
            if (values.Count > 0) CheckValue(file, firstLine, statement, values);
            checkedCount++;
        }
        Assert.True(checkedCount > 0, $"{file}: no expectations found");
        foreach (var d in result.Diagnostics.Where(d => d.Severity == Severity.Error && d.Path is null))
        {
            int line = source.GetPosition(d.Span.Start).Line;
            Assert.True(expectedCodes.Any(e => e.Code == d.Code && Within(line, e.FirstLine, e.LastLine)),
                $"{file}:{line + 1}: unexpected {d.Code} {d.Message}");
        }
    }

    /// <summary>
    /// The expectation after ⇒: a value (<c>NUMBER UNIT</c> or one word), then codes; the rest of
    /// the description names the source.
    /// </summary>
    private static List<string> Expectation(string text)
    {
        var words = text.Split(' ', StringSplitOptions.RemoveEmptyEntries);
        var result = new List<string>();
        int i = 0;
        if (i < words.Length && !words[i].StartsWith("CUT", StringComparison.Ordinal))
        {
            result.Add(words[i]);
            if (double.TryParse(words[i], NumberStyles.Float, CultureInfo.InvariantCulture, out _) && i + 1 < words.Length
                && !words[i + 1].StartsWith("CUT", StringComparison.Ordinal) && !words[i + 1].StartsWith('['))
            {
                result.Add(words[++i]);
            }
            i++;
        }
        while (i < words.Length && words[i].StartsWith("CUT", StringComparison.Ordinal)) result.Add(words[i++]);
        return result;
    }

    private static bool Within(int line, int first, int last) => line >= first && line <= last;

    private static string Describe(SheetResult result, int first, int last) =>
        "[" + string.Join("; ", result.Diagnostics.Where(d => Within(result.Syntax.Source.GetPosition(d.Span.Start).Line, first, last))
            .Select(d => $"{d.Code} {d.Message}")) + "]";

    private static void CheckValue(string file, int line, StatementResult statement, List<string> expected)
    {
        var shown = statement switch
        {
            DefinitionResult d => d.Value,
            _ => null,
        };
        if (statement is CheckResult check)
        {
            Assert.True(expected[0].Equals(check.Status.ToString(), StringComparison.OrdinalIgnoreCase), $"{file}:{line + 1}: expected check {expected[0]}, got {check.Status}");
            return;
        }
        if (expected[0] == "unknown")
        {
            Assert.True(shown is null, $"{file}:{line + 1}: expected unknown, got {shown?.Text}");
            return;
        }
        Assert.True(shown is not null, $"{file}:{line + 1}: value unknown, expected {string.Join(' ', expected)}");
        if (expected.Count == 1 && !double.TryParse(expected[0], NumberStyles.Float, CultureInfo.InvariantCulture, out _))
        {
            Assert.Equal(expected[0], shown!.NumberText);
            return;
        }
        double number = double.Parse(expected[0], NumberStyles.Float, CultureInfo.InvariantCulture);
        string unit = string.Join(" ", expected.Skip(1));
        Assert.True(unit == shown!.Unit, $"{file}:{line + 1}: expected unit '{unit}', got '{shown.Unit}' ({shown.Text})");
        double tolerance = CaseRunner.HalfLastDigit(expected[0]) + 1e-12 * Math.Abs(number);
        Assert.True(Math.Abs(shown.Number - number) <= tolerance, $"{file}:{line + 1}: expected {number} {unit}, got {shown.Number:R} {shown.Unit}");
    }
}
