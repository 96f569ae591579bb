using CutSheet.Editing.Hints;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/inlayHint</c>: values after computed lines and check outcomes, as the settings ask.</summary>
public sealed class InlayHintHandler(ServerContext context) : IRequestHandler<RangeParams, InlayHint[]>
{
    public string Method => "textDocument/inlayHint";

    public async Task<InlayHint[]?> HandleAsync(RangeParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var range = context.Positions.ToSpan(analysis.Source, p.Range);
        return ValueHintProvider.Hints(analysis, context.State.Settings.Hints, range.Start, range.End)
            .Select(h => new InlayHint { Position = context.Positions.ToPosition(analysis.Source, h.Offset), Label = h.Label, PaddingLeft = true })
            .ToArray();
    }
}
