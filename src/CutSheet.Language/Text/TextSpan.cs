namespace CutSheet.Language.Text;

/// <summary>A half-open range of UTF-16 code units in a source text.</summary>
public readonly record struct TextSpan(int Start, int Length)
{
    public int End => Start + Length;

    public static TextSpan FromBounds(int start, int end) => new(start, Math.Max(0, end - start));

    public bool Contains(int offset) => offset >= Start && offset < End;

    /// <summary>True when the offset is inside the span or touches its end (a cursor after the last character).</summary>
    public bool ContainsOrTouches(int offset) => offset >= Start && offset <= End;

    public TextSpan Cover(TextSpan other) => FromBounds(Math.Min(Start, other.Start), Math.Max(End, other.End));

    public override string ToString() => $"[{Start}..{End})";
}
