using System.Globalization;
using CutSheet.Language.Tests.Checks;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Culture;

/// <summary>
/// Evaluation does not depend on the culture of the machine (LANGUAGE.md A.7: "parsing and
/// printing use the invariant culture everywhere; tests run under a decimal-comma culture
/// too"). Every case-file sheet, example sheet, golden input and library sheet is evaluated
/// under the invariant culture and under de-DE, fr-FR and sv-SE (decimal comma; fr-FR also
/// groups with a narrow no-break space, which the tokenizer reads as a space; sv-SE writes
/// its minus sign as U+2212); the snapshots of diagnostics and displayed values must be
/// identical. Unit resolutions are cached per process, so text made while resolving a unit is
/// fixed by whichever run resolved it first; the other texts are made afresh in each culture.
/// </summary>
[Collection(CultureCollection.Name)]
public class CultureInvariancePropertyTests
{
    private static readonly (string Name, string Text)[] Sheets = SheetCorpus.CaseSheets.Concat(SheetCorpus.FileSheets).ToArray();

    [Theory]
    [InlineData("de-DE")]
    [InlineData("fr-FR")]
    [InlineData("sv-SE")]
    public void EvaluationIsTheSameUnderADecimalCommaCulture(string cultureName)
    {
        var culture = DecimalCommaCulture(cultureName);
        string[] invariant;
        using (new CultureScope(CultureInfo.InvariantCulture)) invariant = Sheets.Select(s => ResultSnapshot.Of(SheetRunner.Run(s.Text))).ToArray();
        string[] local;
        using (new CultureScope(culture)) local = Sheets.Select(s => ResultSnapshot.Of(SheetRunner.Run(s.Text))).ToArray();

        Assert.NotEmpty(Sheets);
        var differing = Enumerable.Range(0, Sheets.Length).Where(i => invariant[i] != local[i])
            .Select(i => $"{Sheets[i].Name}\n--- invariant\n{invariant[i]}--- {cultureName}\n{local[i]}").ToList();
        Assert.True(differing.Count == 0, $"{differing.Count} sheet(s) evaluate differently under {cultureName}:\n{string.Join("\n", differing.Take(5))}");
    }

    /// <summary>The whole set of evaluation and check cases passes in-process under de-DE, as it does invariant.</summary>
    [Fact]
    public void EveryCaseFilePassesUnderGerman()
    {
        var failures = new List<string>();
        using (new CultureScope(DecimalCommaCulture("de-DE")))
        {
            foreach (var c in SheetCorpus.CaseFiles.SelectMany(CaseFile.Load))
                Collect(failures, () => CaseRunner.Run((string)c[0], (string)c[1], (string)c[2], (string)c[3]));
            foreach (var c in CheckCaseFile.Load())
                Collect(failures, () => CheckCaseRunner.Run(c));
            Assert.Equal("de-DE", CultureInfo.CurrentCulture.Name);
        }
        Assert.True(failures.Count == 0, $"{failures.Count} case(s) fail under de-DE:\n{string.Join("\n", failures)}");
    }

    /// <summary>The culture, after making sure it really writes a decimal comma here (else the test would prove nothing).</summary>
    private static CultureInfo DecimalCommaCulture(string name)
    {
        var culture = CultureInfo.GetCultureInfo(name, predefinedOnly: true);
        Assert.Equal(",", culture.NumberFormat.NumberDecimalSeparator);
        Assert.Equal("1,5", 1.5.ToString(culture));
        return culture;
    }

    private static void Collect(List<string> failures, Action run)
    {
        try { run(); }
        catch (Exception e) { failures.Add(e.Message); }
    }
}
