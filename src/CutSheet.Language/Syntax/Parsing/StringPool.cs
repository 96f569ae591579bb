namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// One string per distinct name or unit in a sheet: a name used on a thousand lines is one
/// string, not a thousand, which keeps parsing light on the garbage collector.
/// </summary>
internal sealed class StringPool
{
    private readonly HashSet<string> _strings = new(StringComparer.Ordinal);

    public string Get(string text, int start, int length)
    {
        var lookup = _strings.GetAlternateLookup<ReadOnlySpan<char>>();
        var span = text.AsSpan(start, length);
        if (lookup.TryGetValue(span, out var existing)) return existing;
        var s = span.ToString();
        _strings.Add(s);
        return s;
    }
}
