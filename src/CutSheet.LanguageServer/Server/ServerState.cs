using CutSheet.LanguageServer.Conversion;

namespace CutSheet.LanguageServer.Server;

/// <summary>Where the session is (before initialize, running, shut down) and what was negotiated.</summary>
public sealed class ServerState
{
    private readonly TaskCompletionSource<int> _exit = new(TaskCreationOptions.RunContinuationsAsynchronously);

    public SessionPhase Phase { get; set; } = SessionPhase.Created;

    public PositionMapper Positions { get; set; } = PositionMapper.Utf16;

    public ServerSettings Settings { get; set; } = ServerSettings.Default;

    /// <summary>True when the client declared inlay hint support; lenses stand in otherwise.</summary>
    public bool ClientShowsHints { get; set; }

    public string? WorkspaceRoot { get; set; }

    /// <summary>The client accepts <c>workspace/inlayHint/refresh</c> (hints of a sheet change when a sheet it imports does).</summary>
    public bool ClientRefreshesHints { get; set; }

    /// <summary>The client watches files for the server when asked at run time.</summary>
    public bool ClientWatchesFiles { get; set; }

    /// <summary>The client accepts <c>workspace/codeLens/refresh</c>.</summary>
    public bool ClientRefreshesLenses { get; set; }

    public bool LensesWanted => Settings.Lenses ?? !ClientShowsHints;

    /// <summary>Completes with the process exit code when the client sends <c>exit</c>.</summary>
    public Task<int> Exited => _exit.Task;

    public void Exit() => _exit.TrySetResult(Phase == SessionPhase.ShutDown ? 0 : 1);
}

public enum SessionPhase { Created, Running, ShutDown }
