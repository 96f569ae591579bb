using CutSheet.Language.Text;

namespace CutSheet.Language.Tests.Parsing;

/// <summary>
/// The line map: LF, CRLF and a lone CR each end a line (LSP counts lines the same way), and a
/// CRLF is one break, never two.
/// </summary>
public sealed class LineMapTests
{
    [Theory]
    [InlineData("", "0")]
    [InlineData("abc", "0")]
    [InlineData("\n", "0 1")]
    [InlineData("\r", "0 1")]
    [InlineData("\r\n", "0 2")]
    [InlineData("a\r\nb\rc\nd", "0 3 5 7")]
    [InlineData("a\n\nb", "0 2 3")]
    [InlineData("a\r\r\nb\n\r", "0 2 4 6 7")]
    [InlineData("x = 1 mm\r\ny = x as in\r\n", "0 10 23")]
    public void Lines_start_after_each_break(string text, string expected)
    {
        var source = new SourceText(text);
        var starts = Enumerable.Range(0, source.LineCount).Select(source.LineStart);
        Assert.Equal(expected, string.Join(' ', starts));
    }

    [Theory]
    [InlineData("a\r\nbc\rd", 5, 1, 2)]
    [InlineData("a\r\nbc\rd", 6, 2, 0)]
    [InlineData("a\r\nbc\rd", 1, 0, 1)]
    public void Offsets_map_to_line_and_column(string text, int offset, int line, int column) =>
        Assert.Equal(new LinePosition(line, column), new SourceText(text).GetPosition(offset));
}
