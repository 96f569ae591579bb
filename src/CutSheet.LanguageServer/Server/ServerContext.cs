using CutSheet.Editing.Analysis;
using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Documents;
using CutSheet.LanguageServer.Protocol;

namespace CutSheet.LanguageServer.Server;

/// <summary>What the handlers share: the session state, the open documents, the scheduler and the converters.</summary>
public sealed class ServerContext
{
    public ServerContext(ServerLog log, LibraryFiles library)
    {
        Log = log;
        Library = library;
        Locator = new SheetLocator(Documents, library);
        Diagnostics = new DiagnosticConverter(Locator);
        Scheduler = new SheetScheduler(State, Documents, Diagnostics, log);
    }

    public ServerState State { get; } = new();

    public DocumentStore Documents { get; } = new();

    public ServerLog Log { get; }

    public LibraryFiles Library { get; }

    public SheetLocator Locator { get; }

    public DiagnosticConverter Diagnostics { get; }

    public SheetScheduler Scheduler { get; }

    public PositionMapper Positions => State.Positions;

    public OpenDocument Document(string uri) =>
        Documents.Find(uri) ?? throw new RequestFailure(ErrorCodes.InvalidParams, ServerMessages.UnknownDocument(uri));

    /// <summary>The document and the evaluation of its latest version (positions convert against that evaluation's text).</summary>
    public async Task<(OpenDocument Document, SheetAnalysis Analysis)> AnalysisAsync(string uri, CancellationToken cancellation)
    {
        var document = Document(uri);
        return (document, await document.LatestAsync(cancellation).ConfigureAwait(false));
    }

    /// <summary>The latest finished evaluations of all open documents, for features that span sheets.</summary>
    public IEnumerable<SheetAnalysis> OpenAnalyses() => Documents.All.Select(d => d.Finished).OfType<SheetAnalysis>();
}
