using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Text;

namespace CutSheet.LanguageServer.Tests;

/// <summary>Positions in the three encodings, against counts worked out by hand.</summary>
public sealed class PositionMapperTests
{
    // "η = 2 N·m 𝜂x": η (1 UTF-16 unit, 2 UTF-8 bytes), '·' (1 unit, 2 bytes), 𝜂 U+1D702 (2 units, 4 bytes, 1 code point).
    private static readonly SourceText Text = new("a\nη = 2 N·m 𝜂x\r\nlast");

    [Theory]
    [InlineData("utf-16", 1, 12, 14)] // 'x' after 𝜂: offset 2 + 12
    [InlineData("utf-8", 1, 16, 14)]  // bytes before the x, counted in the method
    [InlineData("utf-32", 1, 11, 14)] // 11 code points before 'x'
    public void Character_to_offset(string encoding, int line, int character, int offset)
    {
        // Bytes before 'x' in UTF-8: η(2) ' '(1) '='(1) ' '(1) '2'(1) ' '(1) 'N'(1) '·'(2) 'm'(1) ' '(1) '𝜂'(4) = 16.
        var mapper = new PositionMapper(encoding);
        Assert.Equal(offset, mapper.ToOffset(Text, new Position { Line = line, Character = character }));
        var back = mapper.ToPosition(Text, offset);
        Assert.Equal((line, character), (back.Line, back.Character));
    }

    [Theory]
    [InlineData("utf-16", 11)] // inside the surrogate pair: stays before 𝜂
    [InlineData("utf-8", 14)]  // inside 𝜂's four bytes
    public void A_position_inside_a_character_stays_before_it(string encoding, int character) =>
        Assert.Equal(12, new PositionMapper(encoding).ToOffset(Text, new Position { Line = 1, Character = character }));

    [Fact]
    public void Positions_past_a_line_or_the_text_are_clamped()
    {
        var mapper = PositionMapper.Utf16;
        Assert.Equal(1, mapper.ToOffset(Text, new Position { Line = 0, Character = 99 }));
        Assert.Equal(Text.Length, mapper.ToOffset(Text, new Position { Line = 50, Character = 0 }));
        Assert.Equal(0, mapper.ToOffset(Text, new Position { Line = -1, Character = -1 }));
        // An offset inside "\r\n" is the end of the line's content.
        var p = mapper.ToPosition(Text, 16);
        Assert.Equal((1, 13), (p.Line, p.Character));
    }

    [Theory]
    [InlineData(new[] { "utf-32", "utf-8" }, "utf-32")]
    [InlineData(new[] { "latin-1", "utf-8" }, "utf-8")]
    [InlineData(new string[0], "utf-16")]
    public void The_first_encoding_the_server_speaks_wins(string[] offered, string chosen) =>
        Assert.Equal(chosen, PositionMapper.Negotiate(offered));
}
