using CutSheet.Editing.Fixes;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/codeAction</c>: the language's fixes for the diagnostics in the range, as quick fixes.</summary>
public sealed class CodeActionHandler(ServerContext context) : IRequestHandler<CodeActionParams, CodeAction[]>
{
    public string Method => "textDocument/codeAction";

    public async Task<CodeAction[]?> HandleAsync(CodeActionParams p, CancellationToken cancellation)
    {
        var (document, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var range = context.Positions.ToSpan(analysis.Source, p.Range);
        var actions = new List<CodeAction>();
        foreach (var offer in FixProvider.Fixes(analysis, range))
        {
            var changes = new Dictionary<string, List<TextEdit>>(StringComparer.Ordinal);
            foreach (var edit in offer.Fix.Edits)
            {
                var location = context.Locator.ToLocation(edit.Path, edit.Span, edit.Path is null ? analysis.Source : null, document, context.Positions);
                if (location is null) continue;
                if (!changes.TryGetValue(location.Uri, out var list)) changes[location.Uri] = list = [];
                list.Add(new TextEdit { Range = location.Range, NewText = edit.NewText });
            }
            if (changes.Count == 0) continue;
            actions.Add(new CodeAction
            {
                Title = offer.Fix.Title,
                Kind = "quickfix",
                Diagnostics = [context.Diagnostics.Convert(offer.Diagnostic, analysis.Source, document, context.Positions)],
                IsPreferred = offer.Diagnostic.Fixes.Count == 1 ? true : null,
                Edit = new WorkspaceEdit { Changes = changes.ToDictionary(c => c.Key, c => c.Value.ToArray()) },
            });
        }
        return actions.ToArray();
    }
}
