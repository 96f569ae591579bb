using CsCheck;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Evaluation is a function of the text: the same text gives identical diagnostics and
/// displayed values (compared as <see cref="ResultSnapshot"/>s), run after run and when many
/// sheets are evaluated at once on several threads, as an editor's server does.
/// </summary>
public class DeterminismPropertyTests
{
    [Fact]
    public void SameTokenSoupSameResult() =>
        TokenSoupGen.Text.Sample(AssertSameTwice, iter: 1000, print: t => CSharpLiteral.Of(t));

    [Fact]
    public void SameGrammaticalSheetSameResult() =>
        SheetGrammarGen.Sheet.Sample(AssertSameTwice, iter: 1000, print: t => CSharpLiteral.Of(t));

    [Fact]
    public void SameMutatedSheetSameResult() =>
        SheetMutationGen.Sheet.Sample(s => AssertSameTwice(s.Text), iter: 500, print: s => s.ToString());

    [Fact]
    public void ConcurrentRunsMatchSequentialOnes()
    {
        var sheets = SheetCorpus.FileSheets.Concat(SheetCorpus.CaseSheets).ToArray();
        Assert.NotEmpty(sheets);
        var sequential = sheets.Select(s => ResultSnapshot.Of(SheetRunner.Run(s.Text))).ToArray();
        var concurrent = new string[sheets.Length];
        // Several rounds over a shuffled order, so that different sheets meet on the threads.
        for (int round = 0; round < 3; round++)
        {
            var order = Enumerable.Range(0, sheets.Length).OrderBy(i => (i * 7919 + round * 104729) % sheets.Length).ToArray();
            Parallel.ForEach(order, new ParallelOptions { MaxDegreeOfParallelism = 8 },
                i => concurrent[i] = ResultSnapshot.Of(SheetRunner.Run(sheets[i].Text)));
            for (int i = 0; i < sheets.Length; i++)
                Assert.True(sequential[i] == concurrent[i], $"{sheets[i].Name}: concurrent run differs\n--- sequential\n{sequential[i]}--- concurrent\n{concurrent[i]}");
        }
    }

    private static void AssertSameTwice(string text)
    {
        var firstRun = Bounded.Run(() => SheetRunner.Run(text), "first run");
        string first = ResultSnapshot.Of(firstRun);
        string second = ResultSnapshot.Of(Bounded.Run(() => SheetRunner.Run(text), "second run"));
        if (first != second) throw new Xunit.Sdk.XunitException($"two runs differ\n--- first\n{first}--- second\n{second}");
    }
}
