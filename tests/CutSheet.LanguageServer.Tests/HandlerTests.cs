using System.Text.Json.Nodes;
using CutSheet.LanguageServer.Tests.Support;

namespace CutSheet.LanguageServer.Tests;

/// <summary>The handlers not covered by the Node suite, through the protocol: fixes, formatting, colours, folds, signatures, outline.</summary>
public sealed class HandlerTests
{
    private static async Task<(RawLspClient Client, string Uri)> Open(string text)
    {
        var client = new RawLspClient();
        await client.StartAsync();
        string uri = Sheets.TempUri("sheet.cutsheet");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, text));
        await client.DiagnosticsAsync(uri);
        return (client, uri);
    }

    [Fact]
    public async Task Code_action_offers_the_language_fix_as_a_workspace_edit()
    {
        var (client, uri) = await Open("F = 120 lb\np = F / (2 in * 3 in) as psi\n");
        await using var _ = client;
        var actions = await client.RequestAsync("textDocument/codeAction", new
        {
            textDocument = new { uri },
            range = new { start = new { line = 1, character = 26 }, end = new { line = 1, character = 26 } },
            context = new { diagnostics = Array.Empty<object>() },
        });
        var action = actions["result"]!.AsArray().Single()!;
        Assert.Equal("write lbf (pound-force)", (string?)action["title"]);
        Assert.Equal("quickfix", (string?)action["kind"]);
        Assert.Equal("CUT2103", (string?)action["diagnostics"]![0]!["code"]);
        var edit = action["edit"]!["changes"]![uri]![0]!;
        Assert.Equal("lbf", (string?)edit["newText"]);
        Assert.Equal(0, (int?)edit["range"]!["start"]!["line"]);
        Assert.Equal(8, (int?)edit["range"]!["start"]!["character"]);
    }

    [Fact]
    public async Task Formatting_aligns_and_returns_line_edits()
    {
        var (client, uri) = await Open("a = 1 mm   // one\nlong_name=2 mm\n");
        await using var _ = client;
        var edits = await client.RequestAsync("textDocument/formatting", new { textDocument = new { uri }, options = new { tabSize = 4, insertSpaces = true } });
        var texts = edits["result"]!.AsArray().Select(e => (string?)e!["newText"]).ToList();
        Assert.Equal(["a         = 1 mm // one", "long_name = 2 mm"], texts);
    }

    [Fact]
    public async Task Semantic_tokens_tell_units_from_names()
    {
        var (client, uri) = await Open("d = 16 mm\n");
        await using var _ = client;
        var tokens = await client.RequestAsync("textDocument/semanticTokens/full", Sheets.Document(uri));
        var data = tokens["result"]!["data"]!.AsArray().Select(n => (int)n!).ToArray();
        // d (variable, declaration), = (operator), 16 (number), mm (type): five integers each.
        Assert.Equal([0, 0, 1, 6, 1, 0, 2, 1, 5, 0, 0, 2, 2, 1, 0, 0, 3, 2, 2, 0], data);
    }

    [Fact]
    public async Task Folds_signatures_and_outline()
    {
        var (client, uri) = await Open("## A\nx = 1\ny = 2\n## B\nz = round(12.3 mm, \n");
        await using var _ = client;
        var folds = await client.RequestAsync("textDocument/foldingRange", Sheets.Document(uri));
        Assert.Contains(folds["result"]!.AsArray(), f => (int?)f!["startLine"] == 0 && (int?)f["endLine"] == 2 && (string?)f["kind"] == "region");
        var help = await client.RequestAsync("textDocument/signatureHelp", Sheets.At(uri, 4, 19));
        Assert.Equal("round(x, step)", (string?)help["result"]!["signatures"]![0]!["label"]);
        Assert.Equal(1, (int?)help["result"]!["activeParameter"]);
        var outline = await client.RequestAsync("textDocument/documentSymbol", Sheets.Document(uri));
        var sections = outline["result"]!.AsArray();
        Assert.Equal(["A", "B"], sections.Select(s => (string?)s!["name"]));
        Assert.Equal(["x", "y"], sections[0]!["children"]!.AsArray().Select(c => (string?)c!["name"]));
    }
}
