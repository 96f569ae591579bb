using CutSheet.Language.Syntax;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Golden;

/// <summary>
/// Parser golden files: each <c>Golden/Parser/NAME.cutsheet</c> is parsed and dumped with
/// <see cref="SyntaxDumper"/>; the dump must equal <c>NAME.golden</c> beside it. Syntax-coded
/// diagnostics that only evaluation reports (CUT1011, a clause not allowed on a statement)
/// are dumped in a section of their own. With <c>CUTSHEET_BLESS=1</c> the golden files are
/// rewritten instead — review every changed line before committing it.
/// </summary>
public class ParserGoldenTests
{
    private const string BlessVariable = "CUTSHEET_BLESS";

    public static TheoryData<string> Inputs =>
        new(Directory.EnumerateFiles(SheetCorpus.GoldenParserFolder, "*.cutsheet").Select(Path.GetFileName).OrderBy(n => n, StringComparer.Ordinal)!);

    [Theory, MemberData(nameof(Inputs))]
    public void ParsesAsRecorded(string fileName)
    {
        string path = Path.Combine(SheetCorpus.GoldenParserFolder, fileName);
        string goldenPath = Path.ChangeExtension(path, ".golden");
        string text = SheetCorpus.Decode(File.ReadAllBytes(path));
        var syntax = SheetSyntax.Parse(text);
        var runOnly = SheetRunner.Run(text).Diagnostics
            .Where(d => d.Path is null && d.Code.StartsWith("CUT1", StringComparison.Ordinal)
                && !syntax.Diagnostics.Any(p => p.Code == d.Code && p.Span == d.Span && p.Message == d.Message));
        string dump = SyntaxDumper.Dump(syntax, runOnly);

        if (Environment.GetEnvironmentVariable(BlessVariable) == "1")
        {
            File.WriteAllText(goldenPath, dump);
            return;
        }
        Assert.True(File.Exists(goldenPath), $"{fileName}: no golden file; run with {BlessVariable}=1 and review it");
        string expected = File.ReadAllText(goldenPath).ReplaceLineEndings("\n");
        Assert.Equal(expected, dump);
    }

    /// <summary>Every golden file has its input, and there are enough inputs to cover the statement kinds and syntax errors.</summary>
    [Fact]
    public void GoldenFilesPairWithInputs()
    {
        var inputs = Directory.EnumerateFiles(SheetCorpus.GoldenParserFolder, "*.cutsheet").Select(Path.GetFileNameWithoutExtension).ToHashSet();
        var goldens = Directory.EnumerateFiles(SheetCorpus.GoldenParserFolder, "*.golden").Select(Path.GetFileNameWithoutExtension).ToHashSet();
        Assert.Empty(goldens.Except(inputs));
        Assert.Empty(inputs.Except(goldens));
        Assert.True(inputs.Count >= 20, $"only {inputs.Count} golden inputs");
    }
}
