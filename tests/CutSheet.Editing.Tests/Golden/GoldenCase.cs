namespace CutSheet.Editing.Tests.Golden;

/// <summary>
/// One golden case: a sheet with an optional cursor marker <c>$0</c> and optional directive
/// lines <c>//! KEY VALUE</c> (removed before the sheet is read), plus the expected output
/// beside it in <c>NAME.expected</c>.
/// </summary>
public sealed record GoldenCase(string Feature, string Name, string SourcePath, string Text, int? Cursor, IReadOnlyDictionary<string, string> Directives)
{
    public const string Marker = "$0";

    public string ExpectedPath => Path.ChangeExtension(SourcePath, ".expected");

    public static GoldenCase Load(string path)
    {
        var directives = new Dictionary<string, string>(StringComparer.Ordinal);
        var lines = File.ReadAllText(path).Replace("\r\n", "\n").Split('\n').ToList();
        foreach (var line in lines.Where(l => l.StartsWith("//!", StringComparison.Ordinal)).ToList())
        {
            var parts = line[3..].Trim().Split(' ', 2);
            directives[parts[0]] = parts.Length > 1 ? parts[1] : "";
            lines.Remove(line);
        }
        string text = string.Join('\n', lines);
        int marker = text.IndexOf(Marker, StringComparison.Ordinal);
        if (marker >= 0) text = text.Remove(marker, Marker.Length);
        return new GoldenCase(Path.GetFileName(Path.GetDirectoryName(path)!), Path.GetFileNameWithoutExtension(path), path, text,
            marker >= 0 ? marker : null, directives);
    }

    public override string ToString() => $"{Feature}/{Name}";
}
