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

    public StringPool()
    {
        _strings = new HashSet<string>(StringComparer.Ordinal);
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
