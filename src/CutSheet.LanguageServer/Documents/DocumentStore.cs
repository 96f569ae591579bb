using System.Collections.Concurrent;

namespace CutSheet.LanguageServer.Documents;

/// <summary>The open documents by URI, and by full path for imports.</summary>
public sealed class DocumentStore
{
    private readonly ConcurrentDictionary<string, OpenDocument> _byUri = new(StringComparer.Ordinal);

    public OpenDocument Open(string uri, string? path) => _byUri[uri] = new OpenDocument(uri, path);

    public OpenDocument? Find(string uri) => _byUri.GetValueOrDefault(uri);

    public OpenDocument? FindByPath(string path) => _byUri.Values.FirstOrDefault(d => d.Path == path);

    public bool Close(string uri)
    {
        if (!_byUri.TryRemove(uri, out var document)) return false;
        document.Close();
        return true;
    }

    public IReadOnlyList<OpenDocument> All => _byUri.Values.ToList();
}
