using System.Text.Json.Nodes;
using CutSheet.LanguageServer.Tests.Support;

namespace CutSheet.LanguageServer.Tests;

/// <summary>Sheets that import open sheets: diagnostics follow the imported sheet's unsaved edits; rename and references cross the import.</summary>
public sealed class CrossSheetTests
{
    private const string Shared = "P_h = 5 mm/rev   // lead\n";
    private const string Importer = "use \"shared.cutsheet\"\nv = P_h * 600 rpm as mm/min\ncheck v <= 4000 mm/min\n";

    private static async Task<(RawLspClient Client, string Shared, string Importer)> OpenBoth()
    {
        var client = new RawLspClient();
        await client.InitializeAsync(capabilities: new { textDocument = new { inlayHint = new { } }, workspace = new { inlayHint = new { refreshSupport = true } } });
        await client.NotifyAsync("initialized", new { });
        string shared = Sheets.TempUri("shared.cutsheet");
        string importer = new Uri(new Uri(shared), "importer.cutsheet").AbsoluteUri;
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(shared, Shared));
        await client.DiagnosticsAsync(shared);
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(importer, Importer));
        var first = await client.DiagnosticsAsync(importer);
        Assert.Empty(first["diagnostics"]!.AsArray());
        return (client, shared, importer);
    }

    [Fact]
    public async Task An_edit_to_an_open_imported_sheet_refreshes_its_importer()
    {
        var (client, shared, importer) = await OpenBoth();
        await using var _ = client;
        client.ForgetNotifications();
        await client.NotifyAsync("textDocument/didChange", new
        {
            textDocument = new { uri = shared, version = 2 },
            contentChanges = new[] { new { range = new { start = new { line = 0, character = 6 }, end = new { line = 0, character = 14 } }, text = "9 mm/rev" } },
        });
        var failed = await client.DiagnosticsAsync(importer, p => p["diagnostics"]!.AsArray().Count > 0);
        Assert.Equal("CUT4001", (string?)failed["diagnostics"]![0]!["code"]); // 9 mm/rev × 600 rpm = 5400 mm/min > 4000
        // The importer's values changed without an edit of its own: the client is asked to fetch its hints again.
        for (int i = 0; i < 200 && !client.Notifications.Any(n => (string?)n["method"] == "workspace/inlayHint/refresh"); i++) await Task.Delay(10);
        Assert.Contains(client.Notifications, n => (string?)n["method"] == "workspace/inlayHint/refresh");

        client.ForgetNotifications();
        await client.NotifyAsync("textDocument/didChange", new
        {
            textDocument = new { uri = shared, version = 3 },
            contentChanges = new[] { new { range = new { start = new { line = 0, character = 6 }, end = new { line = 0, character = 14 } }, text = "5 mm/rev" } },
        });
        await client.DiagnosticsAsync(importer, p => p["diagnostics"]!.AsArray().Count == 0);
    }

    [Fact]
    public async Task Rename_and_references_cross_the_import()
    {
        var (client, shared, importer) = await OpenBoth();
        await using var _ = client;
        var references = await client.RequestAsync("textDocument/references",
            new { textDocument = new { uri = shared }, position = new { line = 0, character = 1 }, context = new { includeDeclaration = true } });
        var uris = references["result"]!.AsArray().Select(l => (string?)l!["uri"]).ToList();
        Assert.Equal(2, uris.Count);
        Assert.Contains(importer, uris);

        var rename = await client.RequestAsync("textDocument/rename",
            new { textDocument = new { uri = importer }, position = new { line = 1, character = 5 }, newName = "lead_x" });
        var changes = rename["result"]!["changes"]!.AsObject();
        Assert.Equal("lead_x", (string?)changes[shared]![0]!["newText"]);
        Assert.Equal(0, (int?)changes[shared]![0]!["range"]!["start"]!["character"]);
        Assert.Equal(4, (int?)changes[importer]![0]!["range"]!["start"]!["character"]);

        var definition = await client.RequestAsync("textDocument/definition", Sheets.At(importer, 1, 5));
        Assert.Equal(shared, (string?)definition["result"]![0]!["uri"]);
    }

    [Fact]
    public async Task A_sheet_changed_on_disk_refreshes_its_open_importer()
    {
        await using var client = new RawLspClient();
        await client.InitializeAsync(capabilities: new { workspace = new { didChangeWatchedFiles = new { dynamicRegistration = true } } });
        await client.NotifyAsync("initialized", new { });
        for (int i = 0; i < 200 && !client.Notifications.Any(n => (string?)n["method"] == "client/registerCapability"); i++) await Task.Delay(10);
        var registration = client.Notifications.Single(n => (string?)n["method"] == "client/registerCapability");
        Assert.Equal("**/*.cutsheet", (string?)registration["params"]!["registrations"]![0]!["registerOptions"]!["watchers"]![0]!["globPattern"]);

        string importer = Sheets.TempUri("importer.cutsheet");
        string shared = new Uri(new Uri(importer), "shared.cutsheet").LocalPath;
        File.WriteAllText(shared, Shared);
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(importer, Importer));
        await client.DiagnosticsAsync(importer, p => p["diagnostics"]!.AsArray().Count == 0);

        File.WriteAllText(shared, "P_h = 9 mm/rev\n");
        await client.NotifyAsync("workspace/didChangeWatchedFiles", new { changes = new[] { new { uri = new Uri(shared).AbsoluteUri, type = 2 } } });
        var failed = await client.DiagnosticsAsync(importer, p => p["diagnostics"]!.AsArray().Count > 0);
        Assert.Equal("CUT4001", (string?)failed["diagnostics"]![0]!["code"]);
    }

    [Fact]
    public async Task Definition_into_a_library_sheet_opens_a_read_only_file()
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        string uri = Sheets.TempUri("hold.cutsheet");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, Sheets.Hold));
        var definition = await client.RequestAsync("textDocument/definition", Sheets.At(uri, 3, 7));
        string target = new Uri((string)definition["result"]![0]!["uri"]!).LocalPath;
        Assert.EndsWith("screws.cutsheet", target);
        Assert.Contains("lead(pitch: length", File.ReadAllText(target));
        if (!OperatingSystem.IsWindows()) Assert.False(File.GetUnixFileMode(target).HasFlag(UnixFileMode.UserWrite));
        else Assert.True(File.GetAttributes(target).HasFlag(FileAttributes.ReadOnly));
    }
}
