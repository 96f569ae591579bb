using CutSheet.Language.Evaluation;
using CutSheet.Language.Library;
using CutSheet.Language.Text;

namespace CutSheet.Cli.Output;

/// <summary>
/// Converts language spans (UTF-16 offsets into a sheet's text) to <see cref="SourceRange"/>s. Spans
/// without a path belong to the evaluated sheet. A full path is an imported sheet on disk, whose text is
/// read once to build its line map; a relative path is a label such as <c>library/screws.cutsheet</c> for a
/// library sheet shipped inside the tool, shown as it is and read from the library.
/// </summary>
internal sealed class LocationResolver
{
    private readonly SourceText _sheet;
    private readonly string _sheetFullPath;
    private readonly string _workingDirectory;
    private readonly ISheetSource _sources;
    private readonly Dictionary<string, SourceText?> _others = new(StringComparer.Ordinal);

    public LocationResolver(SourceText sheet, string sheetFullPath, string workingDirectory, ISheetSource sources)
    {
        _sheet = sheet;
        _sheetFullPath = sheetFullPath;
        _workingDirectory = workingDirectory;
        _sources = sources;
    }

    /// <summary>True for a path that names no file on disk but a sheet inside the tool.</summary>
    public static bool IsLabel(string path) => !Path.IsPathRooted(path);

    /// <summary>The full path a span with this path belongs to (a library label stays as it is).</summary>
    public string FullPathOf(string? path) => path ?? _sheetFullPath;

    public string DisplayPathOf(string? path)
    {
        string full = FullPathOf(path);
        return IsLabel(full) ? full : DisplayPaths.ForUser(full, _workingDirectory);
    }

    public SourceRange Resolve(string? path, TextSpan span)
    {
        var text = TextOf(path);
        if (text is null) return SourceRange.FileStart;
        var start = text.GetPosition(span.Start);
        var end = text.GetPosition(Math.Max(span.Start, span.End));
        return new SourceRange(start.Line + 1, start.Column + 1, end.Line + 1, end.Column + 1);
    }

    private SourceText? TextOf(string? path)
    {
        string full = FullPathOf(path);
        if (string.Equals(full, _sheetFullPath, StringComparison.Ordinal)) return _sheet;
        if (!_others.TryGetValue(full, out var text))
        {
            // Read through the same sources the language used, so that offsets refer to the same text.
            string? content = IsLabel(full) ? ReadLibrary(full) : _sources.Read(full);
            text = content is null ? null : new SourceText(content, full);
            _others[full] = text;
        }
        return text;
    }

    private static string? ReadLibrary(string label)
    {
        string? name = LibrarySheets.Names.FirstOrDefault(n => string.Equals(LibrarySheets.PathOf(n), label.Replace('\\', '/'), StringComparison.Ordinal));
        return name is null ? null : LibrarySheets.Read(name);
    }
}
