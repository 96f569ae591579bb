using System.Text.Json.Nodes;
using CutSheet.LanguageServer.Tests.Support;

namespace CutSheet.LanguageServer.Tests;

/// <summary>The session's life: nothing before initialize, nothing after shutdown, the exit code, cancellation, settings.</summary>
public sealed class SessionTests
{
    [Fact]
    public async Task Requests_before_initialize_are_refused_and_notifications_dropped()
    {
        await using var client = new RawLspClient();
        var early = await client.RequestAsync("textDocument/hover", Sheets.At("file:///x.cutsheet", 0, 0));
        Assert.Equal(-32002, (int?)early["error"]?["code"]);
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open("file:///tmp/early.cutsheet", "a = 1 mm + 1 kg"));
        var init = await client.InitializeAsync();
        Assert.Equal("utf-16", (string?)init["result"]?["capabilities"]?["positionEncoding"]);
        var late = await client.RequestAsync("textDocument/hover", Sheets.At("file:///tmp/early.cutsheet", 0, 0));
        Assert.Equal(-32602, (int?)late["error"]?["code"]); // the early didOpen was dropped: the document is not open
    }

    [Fact]
    public async Task Shutdown_then_exit_ends_with_zero_and_refuses_requests_in_between()
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        var shutdown = await client.RequestAsync("shutdown", null);
        Assert.True(shutdown.ContainsKey("result") && shutdown["result"] is null, shutdown.ToJsonString());
        var after = await client.RequestAsync("textDocument/documentSymbol", Sheets.Document("file:///x.cutsheet"));
        Assert.Equal(-32600, (int?)after["error"]?["code"]);
        await client.NotifyAsync("exit", null);
        Assert.Equal(0, await client.Server.WaitAsync(TimeSpan.FromSeconds(10)));
    }

    [Fact]
    public async Task Exit_without_shutdown_ends_with_one()
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        await client.NotifyAsync("exit", null);
        Assert.Equal(1, await client.Server.WaitAsync(TimeSpan.FromSeconds(10)));
    }

    [Fact]
    public async Task A_cancelled_request_is_answered_as_cancelled()
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        string uri = Sheets.TempUri("slow.cutsheet");
        var text = new System.Text.StringBuilder();
        for (int i = 0; i < 60000; i++) text.Append("x_").Append(i).Append(" = ").Append(i).Append(" mm * 2\n");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, text.ToString()));
        var (id, answer) = await client.StartRequestAsync("textDocument/documentSymbol", Sheets.Document(uri));
        await client.NotifyAsync("$/cancelRequest", new { id });
        var result = await answer.WaitAsync(TimeSpan.FromSeconds(60));
        // The evaluation may win the race on a fast machine; a cancelled answer must then be -32800.
        if (result["error"] is { } error) Assert.Equal(-32800, (int?)error["code"]);
        else Assert.True(result.ContainsKey("result"));
        var next = await client.RequestAsync("textDocument/foldingRange", Sheets.Document(uri), TimeSpan.FromSeconds(60));
        Assert.True(next.ContainsKey("result"));
    }

    [Fact]
    public async Task A_request_waiting_on_a_document_that_closes_is_answered()
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        string uri = Sheets.TempUri("closing.cutsheet");
        var text = new System.Text.StringBuilder();
        for (int i = 0; i < 40000; i++) text.Append("x_").Append(i).Append(" = ").Append(i).Append(" mm\n");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, text.ToString()));
        var (_, answer) = await client.StartRequestAsync("textDocument/foldingRange", Sheets.Document(uri));
        await client.NotifyAsync("textDocument/didClose", Sheets.Document(uri));
        var result = await answer.WaitAsync(TimeSpan.FromSeconds(30));
        // Either the evaluation finished first, or the request learns that the document is gone.
        if (result["error"] is { } error) Assert.Equal(-32602, (int?)error["code"]);
        var cleared = await client.DiagnosticsAsync(uri, p => p["version"] is null);
        Assert.Empty(cleared["diagnostics"]!.AsArray());
    }

    [Fact]
    public async Task Settings_turn_hints_off_and_lenses_on()
    {
        await using var client = new RawLspClient();
        await client.InitializeAsync(initializationOptions: new { valueHints = new { enabled = false }, valueLenses = true });
        await client.NotifyAsync("initialized", new { });
        string uri = Sheets.TempUri("hold.cutsheet");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, Sheets.Hold));
        var range = new { start = new { line = 0, character = 0 }, end = new { line = 20, character = 0 } };
        var hints = await client.RequestAsync("textDocument/inlayHint", new { textDocument = new { uri }, range });
        Assert.Empty(hints["result"]!.AsArray());
        var lenses = await client.RequestAsync("textDocument/codeLens", Sheets.Document(uri));
        Assert.Empty(lenses["result"]!.AsArray()); // hints are off, and lenses carry the same texts

        await client.NotifyAsync("workspace/didChangeConfiguration", new { settings = new { cutsheet = new { valueHints = new { enabled = true, includeInputs = true } } } });
        hints = await client.RequestAsync("textDocument/inlayHint", new { textDocument = new { uri }, range });
        var labels = hints["result"]!.AsArray().Select(h => (string?)h!["label"]).ToList();
        Assert.Contains("→ 1.100 kN", labels); // an input, shown because includeInputs is on
        Assert.Contains(labels, l => l!.StartsWith("✓ passed", StringComparison.Ordinal));
        lenses = await client.RequestAsync("textDocument/codeLens", Sheets.Document(uri));
        Assert.Contains(lenses["result"]!.AsArray(), l => (string?)l!["command"]!["title"] == "F_rim → 13.13 N");
    }

    [Fact]
    public async Task Lenses_stand_in_for_clients_without_inlay_hints()
    {
        await using var client = new RawLspClient();
        await client.InitializeAsync(capabilities: new { textDocument = new { hover = new { } } });
        await client.NotifyAsync("initialized", new { });
        string uri = Sheets.TempUri("hold.cutsheet");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, Sheets.Hold));
        var lenses = await client.RequestAsync("textDocument/codeLens", Sheets.Document(uri));
        Assert.Contains(lenses["result"]!.AsArray(), l => ((string?)l!["command"]!["title"])!.StartsWith("✓ passed", StringComparison.Ordinal));
    }
}
