using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/didClose</c>: forget the document and clear its diagnostics; importers now read it from disk.</summary>
public sealed class DidCloseHandler(ServerContext context) : INotificationHandler<DidCloseTextDocumentParams>
{
    public string Method => "textDocument/didClose";

    public void Handle(DidCloseTextDocumentParams p)
    {
        var document = context.Documents.Find(p.TextDocument.Uri);
        if (!context.Documents.Close(p.TextDocument.Uri)) return;
        context.Scheduler.Clear(p.TextDocument.Uri);
        if (document?.Path is { } path)
            foreach (var importer in context.Documents.All.Where(d => d.Finished?.Result.Imports.Contains(path) == true))
                context.Scheduler.Start(importer, importer.Restart(), refreshImporters: true);
    }
}
