using CsCheck;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Parsing and evaluation survive any text (see <see cref="SheetInvariants"/>): random
/// characters, random sequences of the language's tokens, sheets that follow the grammar,
/// and real sheets with edits. On failure CsCheck shrinks to a small input and prints it as a
/// C# literal with the seed (set the environment variable CsCheck_Seed to replay it).
/// </summary>
public class RobustnessPropertyTests
{
    [Fact]
    public void AnyText() =>
        AnyTextGen.Text.Sample(text => { SheetInvariants.AssertHold(text); }, iter: 3000, print: t => CSharpLiteral.Of(t));

    [Fact]
    public void TokenSoup() =>
        TokenSoupGen.Text.Sample(text => { SheetInvariants.AssertHold(text); }, iter: 3000, print: t => CSharpLiteral.Of(t));

    [Fact]
    public void GrammaticalSheets() =>
        SheetGrammarGen.Sheet.Sample(text => { SheetInvariants.AssertHold(text); }, iter: 2000, print: t => CSharpLiteral.Of(t));

    [Fact]
    public void MutatedSheets()
    {
        Assert.NotEmpty(SheetMutationGen.Corpus);
        SheetMutationGen.Sheet.Sample(sheet => { SheetInvariants.AssertHold(sheet.Text); }, iter: 1500, print: s => s.ToString());
    }
}
