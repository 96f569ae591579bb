using CutSheet.Editing.Hints;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>textDocument/codeLens</c>: the value-hint texts over their lines, for editors that show no
/// inlay hints (or when the settings ask for them). The lens has an empty command: a label, not a button.
/// </summary>
public sealed class CodeLensHandler(ServerContext context) : IRequestHandler<TextDocumentParams, CodeLens[]>
{
    public string Method => "textDocument/codeLens";

    public async Task<CodeLens[]?> HandleAsync(TextDocumentParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        if (!context.State.LensesWanted) return [];
        return ValueLensProvider.Lenses(analysis, context.State.Settings.Hints)
            .Select(l => new CodeLens { Range = context.Positions.ToRange(analysis.Source, l.Span), Command = new Command { Title = l.Title, CommandName = "" } })
            .ToArray();
    }
}
