using CutSheet.Editing.Outline;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/foldingRange</c>: sections and statements written over several lines.</summary>
public sealed class FoldingRangeHandler(ServerContext context) : IRequestHandler<TextDocumentParams, FoldingRange[]>
{
    public string Method => "textDocument/foldingRange";

    public async Task<FoldingRange[]?> HandleAsync(TextDocumentParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        return OutlineProvider.Folds(analysis)
            .Select(f => new FoldingRange { StartLine = f.StartLine, EndLine = f.EndLine, Kind = f.IsSection ? "region" : null })
            .ToArray();
    }
}
