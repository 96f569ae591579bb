using CutSheet.Editing.Navigation;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/definition</c>: into this sheet, an imported one, or a library sheet's read-only file.</summary>
public sealed class DefinitionHandler(ServerContext context) : IRequestHandler<TextDocumentPositionParams, Location[]>
{
    public string Method => "textDocument/definition";

    public async Task<Location[]?> HandleAsync(TextDocumentPositionParams p, CancellationToken cancellation)
    {
        var (document, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var target = NavigationProvider.Definition(analysis, context.Positions.ToOffset(analysis.Source, p.Position));
        if (target is null) return [];
        var location = context.Locator.ToLocation(target, document, context.Positions);
        return location is null ? [] : [location];
    }
}
