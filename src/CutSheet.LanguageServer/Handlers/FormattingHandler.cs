using CutSheet.Editing.Formatting;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/formatting</c>: the formatter's edits, or none when it will not risk the sheet's meaning.</summary>
public sealed class FormattingHandler(ServerContext context) : IRequestHandler<DocumentFormattingParams, TextEdit[]>
{
    public string Method => "textDocument/formatting";

    public async Task<TextEdit[]?> HandleAsync(DocumentFormattingParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        return SheetFormatter.Format(analysis)
            .Select(e => new TextEdit { Range = context.Positions.ToRange(analysis.Source, e.Span), NewText = e.NewText })
            .ToArray();
    }
}
