using CsCheck;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// Real sheets with a few edits applied: the example sheets, the parser golden inputs, the
/// library sheets and the case-file sheets, each mutated by one to eight <see cref="SheetMutation"/>s.
/// Starting from real sheets keeps most of the text meaningful, so that evaluation — not
/// only parsing — meets the damage.
/// </summary>
public static class SheetMutationGen
{
    public static readonly (string Name, string Text)[] Corpus =
        SheetCorpus.FileSheets.Concat(SheetCorpus.CaseSheets).ToArray();

    /// <summary>One edit of a sheet: a kind, places in the text, and a character or token to put there.</summary>
    public static readonly Gen<SheetMutation> Mutation =
        Gen.Select(Gen.Int[0, SheetMutation.KindCount - 1], Gen.Int[0, 100_000], Gen.Int[0, 100_000], AnyTextGen.Char, TokenSoupGen.Piece,
            (kind, position, other, c, piece) => new SheetMutation(kind, position, other, c, piece));

    /// <summary>A mutated sheet: where it came from, the edits, and the resulting text.</summary>
    public static readonly Gen<MutatedSheet> Sheet =
        from index in Gen.Int[0, Math.Max(0, Corpus.Length - 1)]
        from mutations in Mutation.Array[1, 8]
        select new MutatedSheet(Corpus[index].Name, mutations, mutations.Aggregate(Corpus[index].Text, (t, m) => m.ApplyTo(t)));
}
