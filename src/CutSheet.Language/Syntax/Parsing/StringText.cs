namespace CutSheet.Language.Syntax.Parsing;

/// <summary>The value of a quoted string token: quotes removed, <c>\"</c> and <c>\\</c> unescaped.</summary>
internal static class StringText
{
    public static string Value(string raw)
    {
        if (raw.Length == 0) return raw;
        int start = 1;
        int end = raw.Length;
        if (end > 1 && raw[end - 1] is '"' or '”' or '“') end--;
        var body = raw[start..Math.Max(start, end)];
        return body.Contains('\\') ? body.Replace("\\\"", "\"").Replace("\\\\", "\\") : body;
    }
}
