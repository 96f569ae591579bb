using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>textDocument/didChange</c>: apply the changes at once (synchronously, so the next
/// message sees them), then evaluate. A change for a version the document already has, or an
/// older one, is stale and ignored; ranges past the end are applied up to the end.
/// </summary>
public sealed class DidChangeHandler(ServerContext context) : INotificationHandler<DidChangeTextDocumentParams>
{
    public string Method => "textDocument/didChange";

    public void Handle(DidChangeTextDocumentParams p)
    {
        var document = context.Documents.Find(p.TextDocument.Uri);
        if (document is null)
        {
            context.Log.Warning(ServerMessages.UnknownDocument(p.TextDocument.Uri));
            return;
        }
        if (p.TextDocument.Version <= document.Version)
        {
            context.Log.Warning(ServerMessages.StaleChange(document.Uri, p.TextDocument.Version, document.Version));
            return;
        }
        var text = TextChanges.Apply(document.Text, p.ContentChanges ?? [], context.Positions, out bool clamped);
        if (clamped) context.Log.Warning(ServerMessages.EditClamped(document.Uri));
        var superseded = document.Update(text, p.TextDocument.Version);
        context.Scheduler.Start(document, superseded, refreshImporters: true);
    }
}
