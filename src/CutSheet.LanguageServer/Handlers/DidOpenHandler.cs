using CutSheet.Language.Text;
using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/didOpen</c>: store the text and start evaluating it.</summary>
public sealed class DidOpenHandler(ServerContext context) : INotificationHandler<DidOpenTextDocumentParams>
{
    public string Method => "textDocument/didOpen";

    public void Handle(DidOpenTextDocumentParams p)
    {
        var item = p.TextDocument;
        var document = context.Documents.Open(item.Uri, DocumentUris.ToPath(item.Uri));
        var superseded = document.Update(new SourceText(item.Text ?? "", document.Path), item.Version);
        context.Scheduler.Start(document, superseded, refreshImporters: true);
    }
}
