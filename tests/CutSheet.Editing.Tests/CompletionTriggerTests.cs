using CutSheet.Editing.Analysis;
using CutSheet.Editing.Completion;

namespace CutSheet.Editing.Tests;

/// <summary>Completion asked for by typing a space or a dot answers only where that character leads somewhere.</summary>
public sealed class CompletionTriggerTests
{
    private static CompletionResult At(string text, string trigger) =>
        CompletionProvider.Complete(SheetAnalysis.Evaluate(text, null, 1), text.Length, trigger);

    [Fact]
    public void A_space_after_a_number_offers_units() => Assert.Equal("mm", At("d = 16 ", " ").Items[0].Label);

    [Fact]
    public void A_space_after_as_offers_units() => Assert.Contains(At("d = 16 mm as ", " ").Items, i => i.Label == "in");

    [Fact]
    public void A_space_elsewhere_offers_nothing() => Assert.Empty(At("d = 16 mm\nx = d ", " ").Items);

    [Fact]
    public void A_dot_after_an_alias_offers_its_names() => Assert.Contains(At("use screws as s\nx = s.", ".").Items, i => i.Label == "lead");

    [Fact]
    public void A_dot_in_a_number_offers_nothing() => Assert.Empty(At("x = 1.", ".").Items);
}
