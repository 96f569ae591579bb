using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>workspace/didChangeWatchedFiles</c>: a sheet changed on disk. An open sheet's editor text
/// governs and is left alone; the open sheets that import a changed sheet are evaluated again.
/// </summary>
public sealed class DidChangeWatchedFilesHandler(ServerContext context) : INotificationHandler<DidChangeWatchedFilesParams>
{
    public string Method => "workspace/didChangeWatchedFiles";

    public void Handle(DidChangeWatchedFilesParams p)
    {
        var changed = (p.Changes ?? []).Select(c => DocumentUris.ToPath(c.Uri)).OfType<string>()
            .Where(path => context.Documents.FindByPath(path) is null)
            .ToHashSet(StringComparer.Ordinal);
        if (changed.Count == 0) return;
        foreach (var importer in context.Documents.All.Where(d => d.Finished?.Result.Imports.Any(changed.Contains) == true))
            context.Scheduler.Start(importer, importer.Restart(), refreshImporters: true);
    }
}
