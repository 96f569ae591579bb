namespace CutSheet.LanguageServer.Conversion;

/// <summary>Document URIs and file paths. Only <c>file:</c> URIs have a path; other documents evaluate without one.</summary>
public static class DocumentUris
{
    public static string? ToPath(string uri)
    {
        if (!Uri.TryCreate(uri, UriKind.Absolute, out var parsed) || !parsed.IsFile) return null;
        try
        {
            return Path.GetFullPath(parsed.LocalPath);
        }
        catch (Exception e) when (e is ArgumentException or NotSupportedException or PathTooLongException)
        {
            return null;
        }
    }

    public static string FromPath(string path) => new Uri(Path.GetFullPath(path)).AbsoluteUri;
}
