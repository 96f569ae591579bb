namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// One string per distinct name or unit in a sheet: a name used on a thousand lines is one
/// string, not a thousand, which keeps parsing light on the garbage collector.
/// </summary>
internal sealed class StringPool
{
    private readonly HashSet<string> _strings;

    /// <summary>Looks spans up without making a string; got once, since getting it checks the comparer's type.</summary>
    private readonly HashSet<string>.AlternateLookup<ReadOnlySpan<char>> _lookup;

    /// <param name="capacity">About how many distinct strings to expect (a sheet's line count is a fair guess), so the set need not grow.</param>
    public StringPool(int capacity = 0)
    {
        _strings = new HashSet<string>(capacity, StringComparer.Ordinal);
        _lookup = _strings.GetAlternateLookup<ReadOnlySpan<char>>();
    }

    public string Get(string text, int start, int length)
    {
        var span = text.AsSpan(start, length);
        if (_lookup.TryGetValue(span, out var existing)) return existing;
        var s = span.ToString();
        _strings.Add(s);
        return s;
    }
}
