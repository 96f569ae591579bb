using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>textDocument/didSave</c>: the server already has the text; sheets that import the saved
/// one and are not open read it from disk, so the open importers are evaluated again.
/// </summary>
public sealed class DidSaveHandler(ServerContext context) : INotificationHandler<DidSaveTextDocumentParams>
{
    public string Method => "textDocument/didSave";

    public void Handle(DidSaveTextDocumentParams p)
    {
        if (context.Documents.Find(p.TextDocument.Uri)?.Path is not { } path) return;
        foreach (var importer in context.Documents.All.Where(d => d.Path != path && d.Finished?.Result.Imports.Contains(path) == true))
            context.Scheduler.Start(importer, importer.Restart(), refreshImporters: true);
    }
}
