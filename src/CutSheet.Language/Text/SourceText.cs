namespace CutSheet.Language.Text;

/// <summary>
/// The text of one sheet with its path and a line map. Offsets are UTF-16 code units;
/// line breaks are LF, CRLF or CR.
/// </summary>
public sealed class SourceText
{
    private readonly int[] _lineStarts;

    public SourceText(string text, string? path = null)
    {
        Text = text ?? string.Empty;
        Path = path;
        _lineStarts = ComputeLineStarts(Text);
    }

    public string Text { get; }

    /// <summary>The full path of the file, or null for text that has no file.</summary>
    public string? Path { get; }

    public int Length => Text.Length;

    public int LineCount => _lineStarts.Length;

    public int LineStart(int line) => _lineStarts[Math.Clamp(line, 0, _lineStarts.Length - 1)];

    /// <summary>The end of the line's content, before its line break.</summary>
    public int LineEnd(int line)
    {
        int end = line + 1 < _lineStarts.Length ? _lineStarts[line + 1] : Text.Length;
        while (end > LineStart(line) && (Text[end - 1] == '\n' || Text[end - 1] == '\r')) end--;
        return end;
    }

    public string LineText(int line) => Text[LineStart(line)..LineEnd(line)];

    public LinePosition GetPosition(int offset)
    {
        offset = Math.Clamp(offset, 0, Text.Length);
        int index = Array.BinarySearch(_lineStarts, offset);
        int line = index >= 0 ? index : ~index - 1;
        return new LinePosition(line, offset - _lineStarts[line]);
    }

    public int GetOffset(LinePosition position)
    {
        if (position.Line < 0) return 0;
        if (position.Line >= _lineStarts.Length) return Text.Length;
        return Math.Min(LineStart(position.Line) + Math.Max(0, position.Column), LineEnd(position.Line));
    }

    public string Slice(TextSpan span) =>
        Text.Substring(Math.Clamp(span.Start, 0, Text.Length), Math.Clamp(span.Length, 0, Text.Length - Math.Clamp(span.Start, 0, Text.Length)));

    private static int[] ComputeLineStarts(string text)
    {
        // A vectorised search for the next break: the language server builds this map for every
        // version of a document, so a character-at-a-time loop showed up in its edit latency.
        var starts = new List<int>(text.Length / 32 + 1) { 0 };
        var rest = text.AsSpan();
        int at = 0;
        while (true)
        {
            int next = rest.IndexOfAny('\r', '\n');
            if (next < 0) break;
            int breakLength = rest[next] == '\r' && next + 1 < rest.Length && rest[next + 1] == '\n' ? 2 : 1;
            at += next + breakLength;
            starts.Add(at);
            rest = rest[(next + breakLength)..];
        }
        return starts.ToArray();
    }
}
