using CutSheet.Editing.Navigation;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/references</c>: in this sheet and in the open sheets that import it.</summary>
public sealed class ReferencesHandler(ServerContext context) : IRequestHandler<ReferenceParams, Location[]>
{
    public string Method => "textDocument/references";

    public async Task<Location[]?> HandleAsync(ReferenceParams p, CancellationToken cancellation)
    {
        var (document, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var found = NavigationProvider.References(analysis, context.OpenAnalyses(), context.Positions.ToOffset(analysis.Source, p.Position),
            p.Context?.IncludeDeclaration ?? true);
        return found.Select(l => context.Locator.ToLocation(l, document, context.Positions)).OfType<Location>().ToArray();
    }
}
