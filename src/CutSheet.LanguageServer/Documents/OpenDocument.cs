using CutSheet.Editing.Analysis;
using CutSheet.Language.Text;

namespace CutSheet.LanguageServer.Documents;

/// <summary>
/// An open document: its current text and version (changed synchronously as notifications
/// arrive) and the evaluation of its latest version (computed in the background). Requests
/// read the latest evaluation; a newer version cancels the evaluation of an older one.
/// </summary>
public sealed class OpenDocument(string uri, string? path)
{
    private readonly Lock _gate = new();
    private CancellationTokenSource _evaluation = new();
    private Task<SheetAnalysis> _latest = Task.FromCanceled<SheetAnalysis>(new CancellationToken(true));
    private SheetAnalysis? _lastFinished;
    private bool _closed;

    public string Uri { get; } = uri;

    public string? Path { get; } = path;

    public int Version { get; private set; }

    public SourceText Text { get; private set; } = new("", path);

    /// <summary>Replaces the text (synchronously, before any await) and returns the token that a newer version will cancel.</summary>
    public CancellationToken Update(SourceText text, int version)
    {
        lock (_gate)
        {
            Text = text;
            Version = version;
            _evaluation.Cancel();
            _evaluation.Dispose();
            _evaluation = new CancellationTokenSource();
            return _evaluation.Token;
        }
    }

    /// <summary>Starts over on the current version (after a change in a sheet it imports).</summary>
    public CancellationToken Restart()
    {
        lock (_gate) return Update(Text, Version);
    }

    public void SetEvaluation(Task<SheetAnalysis> evaluation)
    {
        lock (_gate) _latest = evaluation;
    }

    /// <summary>The evaluation of the latest version; waits while one is running, and follows newer versions.</summary>
    public async Task<SheetAnalysis> LatestAsync(CancellationToken cancellation)
    {
        while (true)
        {
            cancellation.ThrowIfCancellationRequested();
            Task<SheetAnalysis> current;
            lock (_gate)
            {
                // A closed document has no newer version to wait for.
                if (_closed) throw new Server.RequestFailure(Protocol.ErrorCodes.InvalidParams, ServerMessages.UnknownDocument(Uri));
                current = _latest;
            }
            try
            {
                return await current.WaitAsync(cancellation).ConfigureAwait(false);
            }
            catch (OperationCanceledException) when (!cancellation.IsCancellationRequested)
            {
                // Superseded by a newer version: wait for that one instead.
                await Task.Yield();
            }
        }
    }

    /// <summary>The last evaluation that finished, for work across sheets that must not wait (null before the first).</summary>
    public SheetAnalysis? Finished
    {
        get
        {
            lock (_gate) return _lastFinished;
        }
    }

    public void Remember(SheetAnalysis analysis)
    {
        lock (_gate)
        {
            if (_lastFinished is null || analysis.Version >= _lastFinished.Version) _lastFinished = analysis;
        }
    }

    public void Close()
    {
        lock (_gate)
        {
            _closed = true;
            _evaluation.Cancel();
        }
    }
}
