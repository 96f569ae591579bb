using CutSheet.Editing.Completion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>completionItem/resolve</c>: fills in what completion lists leave out (a definition's
/// value, documentation) for the one item the editor shows. An item whose data the server
/// cannot read, or whose document or name is gone, comes back unchanged: the editor then
/// shows what it already has rather than an error.
/// </summary>
public sealed class CompletionResolveHandler(ServerContext context) : IRequestHandler<CompletionItem, CompletionItem>
{
    public string Method => "completionItem/resolve";

    public async Task<CompletionItem?> HandleAsync(CompletionItem item, CancellationToken cancellation)
    {
        if (!CompletionItemData.TryRead(item.Data, out var data)
            || !Enum.TryParse<CompletionCategory>(data.Category, ignoreCase: false, out var category)
            || context.Documents.Find(data.Uri) is not { } document)
            return item;
        var analysis = await document.LatestAsync(cancellation).ConfigureAwait(false);
        if (CompletionResolver.Resolve(analysis, new CompletionKey(category, data.Name, data.Alias)) is not { } details) return item;
        item.Detail = details.Detail ?? item.Detail;
        if (details.Documentation is not null) item.Documentation = new MarkupContent { Value = details.Documentation };
        return item;
    }
}
