using CutSheet.Editing.Navigation;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/rename</c>: one workspace edit over this sheet and the open sheets that import it.</summary>
public sealed class RenameHandler(ServerContext context) : IRequestHandler<RenameParams, WorkspaceEdit>
{
    public string Method => "textDocument/rename";

    public async Task<WorkspaceEdit?> HandleAsync(RenameParams p, CancellationToken cancellation)
    {
        var (document, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var edits = RenameProvider.Rename(analysis, context.OpenAnalyses(), context.Positions.ToOffset(analysis.Source, p.Position), p.NewName ?? "", out string? refusal);
        if (edits is null) throw new RequestFailure(ErrorCodes.RequestFailed, refusal ?? Editing.EditingMessages.NothingToRename);
        var changes = new Dictionary<string, List<TextEdit>>(StringComparer.Ordinal);
        foreach (var edit in edits)
        {
            var location = context.Locator.ToLocation(edit.Path, edit.Span, edit.Text, document, context.Positions);
            if (location is null) continue;
            if (!changes.TryGetValue(location.Uri, out var list)) changes[location.Uri] = list = [];
            list.Add(new TextEdit { Range = location.Range, NewText = edit.NewText });
        }
        return new WorkspaceEdit { Changes = changes.ToDictionary(c => c.Key, c => c.Value.ToArray()) };
    }
}
