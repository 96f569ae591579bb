using CutSheet.Editing.Navigation;
using CutSheet.Editing.Symbols;
using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Library;
using CutSheet.Language.Text;

namespace CutSheet.LanguageServer.Conversion;

/// <summary>
/// Turns the language's places (a path, a library label or null for "this sheet", and a span)
/// into protocol locations: library labels become the read-only files of
/// <see cref="LibraryFiles"/>, spans are converted against the text they were measured in.
/// </summary>
public sealed class SheetLocator(DocumentStore documents, LibraryFiles library)
{
    /// <summary>The URI of a sheet; null path means the document the request was about.</summary>
    public string? UriOf(string? path, OpenDocument current)
    {
        if (path is null || path == current.Path) return current.Uri;
        if (LibraryPaths.IsLibrary(path)) return library.PathOf(path) is { } file ? DocumentUris.FromPath(file) : null;
        return documents.FindByPath(path)?.Uri ?? (Path.IsPathFullyQualified(path) ? DocumentUris.FromPath(path) : null);
    }

    /// <summary>The text a span in that sheet refers to: the one given, the open document's, the library's, or the disk's.</summary>
    public SourceText? TextOf(string? path, OpenDocument current, SourceText? known = null)
    {
        if (known is not null) return known;
        if (path is null || path == current.Path) return current.Text;
        if (documents.FindByPath(path) is { } open) return open.Text;
        if (LibraryPaths.NameOf(path) is { } name) return LibrarySheets.Read(name) is { } text ? new SourceText(text, path) : null;
        try
        {
            return File.Exists(path) ? new SourceText(File.ReadAllText(path), path) : null;
        }
        catch (Exception e) when (e is IOException or UnauthorizedAccessException)
        {
            return null;
        }
    }

    public Location? ToLocation(string? path, TextSpan span, SourceText? text, OpenDocument current, PositionMapper positions)
    {
        string? uri = UriOf(path, current);
        var source = TextOf(path, current, text);
        if (uri is null || source is null) return null;
        return new Location { Uri = uri, Range = positions.ToRange(source, span) };
    }

    public Location? ToLocation(SheetLocation location, OpenDocument current, PositionMapper positions) =>
        ToLocation(location.Path, location.Span, location.Text, current, positions);
}
