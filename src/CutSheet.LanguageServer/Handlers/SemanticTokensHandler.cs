using CutSheet.Editing.Highlighting;
using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/semanticTokens/full</c>: the highlight spans, relative-encoded as the protocol wants.</summary>
public sealed class SemanticTokensHandler(ServerContext context) : IRequestHandler<TextDocumentParams, SemanticTokens>
{
    public string Method => "textDocument/semanticTokens/full";

    public async Task<SemanticTokens?> HandleAsync(TextDocumentParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var data = new List<int>();
        int lastLine = 0, lastStart = 0;
        foreach (var span in HighlightProvider.Highlight(analysis))
        {
            var range = context.Positions.ToRange(analysis.Source, span.Span);
            // Tokens never span lines here (comments, headings and strings end at the line end); clip to be sure.
            if (range.End.Line != range.Start.Line) continue;
            int length = range.End.Character - range.Start.Character;
            if (length <= 0) continue;
            int deltaLine = range.Start.Line - lastLine;
            data.AddRange([deltaLine, deltaLine == 0 ? range.Start.Character - lastStart : range.Start.Character, length,
                SemanticLegend.TypeOf(span.Category), SemanticLegend.ModifiersOf(span)]);
            lastLine = range.Start.Line;
            lastStart = range.Start.Character;
        }
        return new SemanticTokens { Data = data.ToArray() };
    }
}
