using CutSheet.Editing.Analysis;
using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Protocol;
using CutSheet.Language.Evaluation;

namespace CutSheet.LanguageServer.Server;

/// <summary>
/// Evaluates open documents in the background and publishes their diagnostics. A change
/// supersedes the evaluation of the version before it (cancelled, never published); the
/// diagnostics published carry the version they belong to. A change to a sheet re-evaluates
/// the open sheets that import it, directly or through others.
/// </summary>
public sealed class SheetScheduler(ServerState state, DocumentStore documents, DiagnosticConverter diagnostics, ServerLog log)
{

    public ClientChannel? Client { get; set; }

    /// <summary>Starts evaluating the document's current version; call right after changing it.</summary>
    public void Start(OpenDocument document, CancellationToken superseded, bool refreshImporters)
    {
        var text = document.Text;
        int version = document.Version;
        var options = new RunOptions { Sources = new OpenDocumentSource(documents), WorkspaceRoot = state.WorkspaceRoot };
        // The last finished version's parse: statements the edit did not touch are taken from it.
        var previous = document.Finished;
        // No pause before evaluating: a newer version cancels this one (its result is never
        // published), so a burst of keystrokes costs at most some discarded work, and a single
        // edit is answered as soon as the sheet is evaluated.
        var evaluation = Task.Run(() =>
        {
            superseded.ThrowIfCancellationRequested();
            var analysis = SheetAnalysis.Evaluate(text, version, options, previous);
            superseded.ThrowIfCancellationRequested();
            return analysis;
        }, superseded);
        document.SetEvaluation(evaluation);
        _ = evaluation.ContinueWith(t => Finished(document, t, superseded, refreshImporters), CancellationToken.None,
            TaskContinuationOptions.ExecuteSynchronously, TaskScheduler.Default);
    }

    private void Finished(OpenDocument document, Task<SheetAnalysis> evaluation, CancellationToken superseded, bool refreshImporters)
    {
        if (evaluation.IsCanceled || superseded.IsCancellationRequested) return;
        if (evaluation.Exception is { } e)
        {
            log.Error(ServerMessages.HandlerFailed("evaluation of " + document.Uri, e.GetBaseException()));
            return;
        }
        var analysis = evaluation.Result;
        document.Remember(analysis);
        Publish(document, analysis);
        if (refreshImporters && document.Path is not null) RefreshImporters(document.Path);
        // An importer's values changed without an edit of its own: the editor asks again only when told.
        else if (!refreshImporters) RefreshViews();
    }

    /// <summary>Asks the client to request hints and lenses again, where it accepts that.</summary>
    public void RefreshViews()
    {
        if (state.ClientRefreshesHints) Client?.Request("workspace/inlayHint/refresh");
        if (state.ClientRefreshesLenses && state.LensesWanted) Client?.Request("workspace/codeLens/refresh");
    }

    public void Publish(OpenDocument document, SheetAnalysis analysis)
    {
        var converted = diagnostics.Convert(analysis.Result.Diagnostics, analysis.Source, document, state.Positions);
        Client?.Notify("textDocument/publishDiagnostics",
            new PublishDiagnosticsParams { Uri = document.Uri, Version = analysis.Version, Diagnostics = converted });
    }

    /// <summary>Clears a closed document's diagnostics.</summary>
    public void Clear(string uri) =>
        Client?.Notify("textDocument/publishDiagnostics", new PublishDiagnosticsParams { Uri = uri, Diagnostics = [] });

    private void RefreshImporters(string changedPath)
    {
        var affected = new HashSet<OpenDocument>();
        var queue = new Queue<string>([changedPath]);
        while (queue.Count > 0)
        {
            string path = queue.Dequeue();
            foreach (var d in documents.All)
            {
                if (d.Path is null || d.Path == changedPath || affected.Contains(d)) continue;
                if (d.Finished?.Result.Imports.Contains(path) != true) continue;
                affected.Add(d);
                queue.Enqueue(d.Path);
            }
        }
        foreach (var d in affected) Start(d, d.Restart(), refreshImporters: false);
    }
}
