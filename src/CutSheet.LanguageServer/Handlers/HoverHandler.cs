using CutSheet.Editing.Hover;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/hover</c>.</summary>
public sealed class HoverHandler(ServerContext context) : IRequestHandler<TextDocumentPositionParams, Hover>
{
    public string Method => "textDocument/hover";

    public async Task<Hover?> HandleAsync(TextDocumentPositionParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var hover = HoverProvider.Hover(analysis, context.Positions.ToOffset(analysis.Source, p.Position));
        return hover is null ? null : new Hover
        {
            Contents = new MarkupContent { Kind = "markdown", Value = hover.Markdown },
            Range = context.Positions.ToRange(analysis.Source, hover.Span),
        };
    }
}
