using CutSheet.Editing.Navigation;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/prepareRename</c>: the name's range, or an error saying why it cannot be renamed.</summary>
public sealed class PrepareRenameHandler(ServerContext context) : IRequestHandler<TextDocumentPositionParams, PrepareRenameResult>
{
    public string Method => "textDocument/prepareRename";

    public async Task<PrepareRenameResult?> HandleAsync(TextDocumentPositionParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var prepared = RenameProvider.Prepare(analysis, context.Positions.ToOffset(analysis.Source, p.Position), out string? refusal);
        if (prepared is not { } r) throw new RequestFailure(ErrorCodes.RequestFailed, refusal ?? Editing.EditingMessages.NothingToRename);
        return new PrepareRenameResult { Range = context.Positions.ToRange(analysis.Source, r.Span), Placeholder = r.Name };
    }
}
