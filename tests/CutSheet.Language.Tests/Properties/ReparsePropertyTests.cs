using CsCheck;
using CutSheet.Language.Syntax;
using CutSheet.Language.Tests.Support;
using CutSheet.Language.Text;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// A parse that takes unchanged statements over from an earlier parse of the sheet (as the language
/// server does on every edit) is the parse a fresh start gives: the same statements, the same
/// syntax diagnostics, the same evaluation. Each case edits a real sheet step by step, one to
/// eight edits, and re-parses after every step from the step before.
/// </summary>
public class ReparsePropertyTests
{
    private static readonly Gen<(int Index, SheetMutation[] Edits)> Edits =
        Gen.Select(Gen.Int[0, Math.Max(0, SheetMutationGen.Corpus.Length - 1)], SheetMutationGen.Mutation.Array[1, 8]);

    [Fact]
    public void ReparseAfterEachEditEqualsAFreshParse() =>
        Edits.Sample(c =>
        {
            var (name, text) = SheetMutationGen.Corpus[c.Index];
            var previous = SheetSyntax.Parse(new SourceText(text, "/work/sheet.cutsheet"), null);
            foreach (var edit in c.Edits)
            {
                text = edit.ApplyTo(text);
                var source = new SourceText(text, "/work/sheet.cutsheet");
                var reused = Bounded.Run(() => SheetSyntax.Parse(source, previous), "re-parse");
                var fresh = SheetSyntax.Parse(source);
                string a = SyntaxDumper.Dump(reused), b = SyntaxDumper.Dump(fresh);
                if (a != b) throw new Xunit.Sdk.XunitException($"{name} after {edit}: the re-parse differs\n--- re-parse\n{a}--- fresh\n{b}");
                previous = reused;
            }
            string evaluatedReused = ResultSnapshot.Of(SheetRunner.Run(previous));
            string evaluatedFresh = ResultSnapshot.Of(SheetRunner.Run(text, "/work/sheet.cutsheet"));
            if (evaluatedReused != evaluatedFresh) throw new Xunit.Sdk.XunitException($"{name}: evaluation of the re-parse differs");
        }, iter: 400, print: c => $"{SheetMutationGen.Corpus[c.Index].Name} with [{string.Join(", ", c.Edits.Select(e => e.ToString()))}]");

    [Fact]
    public void AnUneditedStatementIsTakenOverAndAnEditedOneIsNot()
    {
        const string before = "a = 1 mm\nb = a * 2\nc = b + 1 mm\n";
        const string after = "a = 1 mm\nb = a * 3\nc = b + 1 mm\n";
        var first = SheetSyntax.Parse(new SourceText(before), null);
        var second = SheetSyntax.Parse(new SourceText(after), first);
        Assert.Same(first.Statements[0], second.Statements[0]);
        Assert.NotSame(first.Statements[1], second.Statements[1]);
        Assert.Same(first.Statements[2], second.Statements[2]);
        // An insertion moves every later statement: those are parsed again, at their new places.
        var third = SheetSyntax.Parse(new SourceText("x = 2\n" + after), second);
        Assert.All(third.Statements, s => Assert.DoesNotContain(s, second.Statements));
        // A command line's parse keeps nothing to take over.
        var plain = SheetSyntax.Parse(before);
        Assert.NotSame(plain.Statements[0], SheetSyntax.Parse(new SourceText(after), plain).Statements[0]);
    }
}
