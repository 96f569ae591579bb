using System.Text;
using CutSheet.Language.Syntax;
using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.RoundTrip;

/// <summary>
/// Parse → print is lossless (LANGUAGE.md "File"; ARCHITECTURE.md: tokens keep their trivia):
/// every example sheet, parser golden input and library sheet prints back byte for byte,
/// byte-order mark, line breaks, tabs and no-break spaces included.
/// </summary>
public class LosslessRoundTripTests
{
    public static TheoryData<string> Files =>
        new(new[] { RepoPaths.Examples, SheetCorpus.GoldenParserFolder, SheetCorpus.LibraryFolder }
            .Where(Directory.Exists)
            .SelectMany(d => Directory.EnumerateFiles(d, "*.cutsheet", SearchOption.AllDirectories))
            .Select(f => Path.GetRelativePath(RepoPaths.Root, f))
            .OrderBy(f => f, StringComparer.Ordinal));

    [Theory, MemberData(nameof(Files))]
    public void PrintsBackByteIdentical(string relativePath)
    {
        byte[] bytes = File.ReadAllBytes(Path.Combine(RepoPaths.Root, relativePath));
        string printed = SheetSyntax.Parse(SheetCorpus.Decode(bytes)).Print();
        byte[] again = new UTF8Encoding(false).GetBytes(printed);
        Assert.True(bytes.AsSpan().SequenceEqual(again), $"{relativePath}: {bytes.Length} bytes in, {again.Length} bytes printed");
    }

    /// <summary>The sets the theory walks are really there (examples may still be empty).</summary>
    [Fact]
    public void GoldenInputsAndLibrarySheetsAreFound()
    {
        Assert.NotEmpty(SheetCorpus.GoldenInputs);
        Assert.NotEmpty(SheetCorpus.Library);
    }

    /// <summary>A text with a byte-order mark and every kind of line break prints back as it was.</summary>
    [Fact]
    public void ByteOrderMarkAndMixedLineBreaksSurvive()
    {
        string text = "\uFEFF# T\r\nx = 1 mm\ry = 2 mm\n\tz = x\u00A0+ y // d\r\n";
        Assert.Equal(text, SheetSyntax.Parse(text).Print());
    }
}
