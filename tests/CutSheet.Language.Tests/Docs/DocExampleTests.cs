using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Docs;

/// <summary>
/// Every worked example in docs/ evaluates as the document shows it (see <see cref="DocExamples"/>).
/// The expected outputs are the evaluator's own, blessed once and then read and checked by hand
/// against the prose and the sources it names; this test keeps the documents from drifting
/// away from the language, it does not prove the numbers (the case files do that).
/// </summary>
public class DocExampleTests
{
    public static TheoryData<string> Documents => new() { "language.md", "units.md", "architecture.md" };

    [Theory, MemberData(nameof(Documents))]
    public void Examples_evaluate_as_documented(string document)
    {
        string path = Path.Combine(RepoPaths.Root, "docs", document);
        var outcome = DocExamples.Check(path);
        Assert.True(outcome.CodeRows.Count == 0, DocExamples.Describe(document, outcome.CodeRows, codeRows: true));
        if (DocExamples.Blessing) return;   // result blocks rewritten in place: read the diff
        Assert.True(outcome.Mismatches.Count == 0, DocExamples.Describe(document, outcome.Mismatches));
    }
}
