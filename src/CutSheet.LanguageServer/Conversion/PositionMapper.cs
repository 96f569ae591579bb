using System.Text;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Text;
using Range = CutSheet.LanguageServer.Protocol.Range;

namespace CutSheet.LanguageServer.Conversion;

/// <summary>
/// The one place where protocol positions and text offsets meet. Offsets are UTF-16 code
/// units (the language's); a position's character counts in the negotiated encoding: UTF-16
/// code units (the default), UTF-8 bytes or code points (UTF-32). Greek letters and <c>·</c>
/// take two UTF-8 bytes, so the encodings differ on most sheets. Positions past the end of a
/// line or of the text are clamped, as the protocol asks.
/// </summary>
public sealed class PositionMapper(string encoding)
{
    public static readonly PositionMapper Utf16 = new(PositionEncodings.Utf16);

    public string Encoding { get; } = encoding;

    public int ToOffset(SourceText text, Position position)
    {
        if (position.Line < 0) return 0;
        if (position.Line >= text.LineCount) return text.Length;
        int start = text.LineStart(position.Line), end = text.LineEnd(position.Line);
        int units = Math.Max(0, position.Character);
        int offset = start;
        while (offset < end && units > 0)
        {
            int width = char.IsHighSurrogate(text.Text[offset]) && offset + 1 < end && char.IsLowSurrogate(text.Text[offset + 1]) ? 2 : 1;
            int cost = Cost(text.Text, offset, width);
            if (cost > units) break; // inside a character: stay before it
            units -= cost;
            offset += width;
        }
        return offset;
    }

    public Position ToPosition(SourceText text, int offset)
    {
        offset = Math.Clamp(offset, 0, text.Length);
        var at = text.GetPosition(offset);
        int start = text.LineStart(at.Line);
        // An offset inside a line break counts as the end of the line's content.
        offset = Math.Min(offset, Math.Max(start, text.LineEnd(at.Line)));
        if (Encoding == PositionEncodings.Utf16) return new Position { Line = at.Line, Character = offset - start };
        int units = 0;
        for (int i = start; i < offset;)
        {
            int width = char.IsHighSurrogate(text.Text[i]) && i + 1 < offset && char.IsLowSurrogate(text.Text[i + 1]) ? 2 : 1;
            units += Cost(text.Text, i, width);
            i += width;
        }
        return new Position { Line = at.Line, Character = units };
    }

    public Range ToRange(SourceText text, TextSpan span) =>
        new() { Start = ToPosition(text, span.Start), End = ToPosition(text, span.End) };

    public TextSpan ToSpan(SourceText text, Range range)
    {
        int start = ToOffset(text, range.Start), end = ToOffset(text, range.End);
        return TextSpan.FromBounds(Math.Min(start, end), Math.Max(start, end));
    }

    private int Cost(string text, int index, int width) => Encoding switch
    {
        PositionEncodings.Utf8 => width == 2 ? 4 : System.Text.Encoding.UTF8.GetByteCount(text.AsSpan(index, 1)),
        PositionEncodings.Utf32 => 1,
        _ => width,
    };

    /// <summary>The encoding to use: the first of the client's that the server speaks; UTF-16 when the client names none.</summary>
    public static string Negotiate(IEnumerable<string>? offered)
    {
        foreach (var e in offered ?? [])
            if (e is PositionEncodings.Utf8 or PositionEncodings.Utf16 or PositionEncodings.Utf32) return e;
        return PositionEncodings.Utf16;
    }
}
