using System.Text;
using System.Text.Json.Nodes;
using CutSheet.LanguageServer.Tests.Support;

namespace CutSheet.LanguageServer.Tests;

/// <summary>
/// The malformed-message corpus: for each case the server gives the right answer (or, for a
/// notification, none) and then still serves the next valid request.
/// </summary>
public sealed class MalformedMessageTests
{
    private delegate Task Case(RawLspClient client, string uri);

    private static int? Code(JsonObject answer) => (int?)answer["error"]?["code"];

    private static async Task ExpectError(Task<JsonObject> request, int code)
    {
        var answer = await request;
        Assert.Equal(code, Code(answer));
        Assert.Null(answer["error"]!["data"]); // no exception type, no stack trace
        Assert.False(string.IsNullOrWhiteSpace((string?)answer["error"]!["message"]));
    }

    /// <summary>Bodies that are not JSON: "parse error", id null (JSON-RPC 2.0, section 5.1).</summary>
    private static Task ExpectParseError(RawLspClient client) => ExpectUnmatched(client, -32700);

    /// <summary>JSON that is no request object: "invalid request", id null.</summary>
    private static Task ExpectInvalidRequest(RawLspClient client) => ExpectUnmatched(client, -32600);

    private static async Task ExpectUnmatched(RawLspClient client, int code)
    {
        var answer = await client.Unmatched.NextAsync();
        Assert.Equal(code, Code(answer));
        Assert.Null(answer["id"]?.GetValue<object?>());
        Assert.Null(answer["error"]!["data"]);
    }

    private static async Task ExpectResult(Task<JsonObject> request)
    {
        var answer = await request;
        Assert.True(answer.ContainsKey("result"), answer.ToJsonString());
    }

    /// <summary>A completion item the server cannot resolve comes back as sent: its label is "x" in every such case here.</summary>
    private static async Task ExpectUnchanged(Task<JsonObject> request)
    {
        var answer = await request;
        Assert.Equal("x", (string?)answer["result"]?["label"]);
        Assert.Null(answer["result"]!["detail"]);
    }

    private static readonly Dictionary<string, Case> Cases = new()
    {
        ["body is not JSON"] = async (c, _) => { await c.SendBodyAsync("{not json"); await ExpectParseError(c); },
        ["body is cut off"] = async (c, _) => { await c.SendBodyAsync("""{"jsonrpc":"2.0","id":5,"method":"textDocument/hover","par"""); await ExpectParseError(c); },
        ["body is a JSON string"] = async (c, _) => { await c.SendBodyAsync("\"hello\""); await ExpectInvalidRequest(c); },
        ["body is JSON null"] = async (c, _) => { await c.SendBodyAsync("null"); await ExpectInvalidRequest(c); },
        ["body is a number"] = async (c, _) => { await c.SendBodyAsync("42"); await ExpectInvalidRequest(c); },
        ["body is an array"] = async (c, _) => { await c.SendBodyAsync("[1, 2, 3]"); await ExpectInvalidRequest(c); },
        ["body is invalid UTF-8"] = async (c, _) => { await c.SendBodyAsync(new byte[] { 0x7B, 0xFF, 0xFE, 0x7D }); await ExpectParseError(c); },
        ["body is blank"] = async (c, _) => { await c.SendBodyAsync("   \n"); await ExpectParseError(c); },
        ["unknown request"] = (c, _) => ExpectError(c.RequestAsync("cutsheet/noSuchThing", new { }), -32601),
        ["unknown dollar request"] = (c, _) => ExpectError(c.RequestAsync("$/noSuchThing", new { }), -32601),
        ["unknown notification"] = (c, _) => c.NotifyAsync("cutsheet/whatever", new { a = 1 }),
        ["unknown dollar notification"] = (c, _) => c.NotifyAsync("$/setTrace", new { value = "off" }),
        ["params are a number"] = (c, _) => ExpectError(c.RequestAsync("textDocument/hover", 42), -32600), // params must be an object or array
        ["params are an array"] = (c, uri) => ExpectError(c.RequestAsync("textDocument/hover", new object[] { uri, 1 }), -32602),
        ["position is a string"] = (c, uri) => ExpectError(c.RequestAsync("textDocument/hover", new { textDocument = new { uri }, position = "start" }), -32602),
        ["line is a string"] = (c, uri) => ExpectError(c.RequestAsync("textDocument/hover", new { textDocument = new { uri }, position = new { line = "one", character = 0 } }), -32602),
        ["hover without params"] = (c, _) => ExpectError(c.RequestAsync("textDocument/hover", null), -32602),
        ["document not open"] = (c, _) => ExpectError(c.RequestAsync("textDocument/hover", Sheets.At("file:///nowhere/x.cutsheet", 0, 0)), -32602),
        ["document uri is not a uri"] = (c, _) => ExpectError(c.RequestAsync("textDocument/documentSymbol", Sheets.Document("::::")), -32602),
        ["line far past the end"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/hover", Sheets.At(uri, 100000, 3))),
        ["negative position"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/hover", Sheets.At(uri, -4, -7))),
        ["character past the line end"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/completion", Sheets.At(uri, 2, 5000))),
        ["resolve with data a number"] = (c, _) => ExpectUnchanged(c.RequestAsync("completionItem/resolve", new { label = "x", data = 42 })),
        ["resolve with data of the wrong shape"] = (c, _) => ExpectUnchanged(c.RequestAsync("completionItem/resolve", new { label = "x", data = new { uri = 7, name = new[] { 1 } } })),
        ["resolve for a closed document"] = (c, _) => ExpectUnchanged(c.RequestAsync("completionItem/resolve",
            new { label = "x", data = new { uri = "file:///nowhere/closed.cutsheet", category = "Definition", name = "x" } })),
        ["resolve with an unknown category"] = (c, uri) => ExpectUnchanged(c.RequestAsync("completionItem/resolve",
            new { label = "x", data = new { uri, category = "Spaceship", name = "F_rim" } })),
        ["resolve without data"] = (c, _) => ExpectUnchanged(c.RequestAsync("completionItem/resolve", new { label = "x" })),
        ["resolve without params"] = (c, _) => ExpectError(c.RequestAsync("completionItem/resolve", null), -32602),
        ["inverted range for inlay hints"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/inlayHint",
            new { textDocument = new { uri }, range = new { start = new { line = 9, character = 0 }, end = new { line = 0, character = 0 } } })),
        ["request id is a string"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/documentSymbol", Sheets.Document(uri), id: "text-id")),
        ["initialize twice"] = (c, _) => ExpectError(c.InitializeAsync(), -32600),
        ["rename to a reserved word"] = (c, uri) => ExpectError(c.RequestAsync("textDocument/rename", new { textDocument = new { uri }, position = new { line = 2, character = 1 }, newName = "check" }), -32803),
        ["prepare rename on nothing"] = (c, uri) => ExpectError(c.RequestAsync("textDocument/prepareRename", Sheets.At(uri, 1, 0)), -32803),
        ["cancel an unknown request"] = (c, _) => c.NotifyAsync("$/cancelRequest", new { id = 987654 }),
        ["cancel with a wrong id type"] = (c, _) => c.NotifyAsync("$/cancelRequest", new { id = new { x = 1 } }),
        ["stale change is ignored"] = async (c, uri) =>
        {
            await c.NotifyAsync("textDocument/didChange", new { textDocument = new { uri, version = 1 }, contentChanges = new[] { new { text = "garbage = = =" } } });
            var symbols = await c.RequestAsync("textDocument/documentSymbol", Sheets.Document(uri));
            Assert.Contains("F_rim", symbols.ToJsonString());
        },
        ["change past the end is clamped"] = async (c, uri) =>
        {
            await c.NotifyAsync("textDocument/didChange", new
            {
                textDocument = new { uri, version = 7 },
                contentChanges = new[] { new { range = new { start = new { line = 500, character = 0 }, end = new { line = 600, character = 9 } }, text = "\nz = 1 mm" } },
            });
            var d = await c.DiagnosticsAsync(uri, p => (int?)p["version"] == 7);
            var symbols = await c.RequestAsync("textDocument/documentSymbol", Sheets.Document(uri));
            Assert.Contains("\"z\"", symbols.ToJsonString());
        },
        ["change to a closed document"] = (c, _) => c.NotifyAsync("textDocument/didChange",
            new { textDocument = new { uri = "file:///nowhere/closed.cutsheet", version = 3 }, contentChanges = new[] { new { text = "a = 1" } } }),
        ["change with a wrong shape"] = (c, uri) => c.NotifyAsync("textDocument/didChange", new { textDocument = new { uri, version = 9 }, contentChanges = "all of it" }),
        ["open with text missing"] = (c, _) => c.NotifyAsync("textDocument/didOpen", new { textDocument = new { uri = "file:///tmp/empty.cutsheet", languageId = "cutsheet", version = 1 } }),
        ["huge document"] = async (c, _) =>
        {
            var text = new StringBuilder();
            for (int i = 0; i < 20000; i++) text.Append("x_").Append(i).Append(" = ").Append(i).Append(" mm + 2 mm\n");
            text.Append("bad = 1 mm + 1 kg\n");
            string big = Sheets.TempUri("big.cutsheet");
            await c.NotifyAsync("textDocument/didOpen", Sheets.Open(big, text.ToString()));
            var d = await c.DiagnosticsAsync(big, timeout: TimeSpan.FromSeconds(60));
            Assert.Single(d["diagnostics"]!.AsArray());
        },
        ["code action with an empty context"] = (c, uri) => ExpectResult(c.RequestAsync("textDocument/codeAction",
            new { textDocument = new { uri }, range = new { start = new { line = 0, character = 0 }, end = new { line = 0, character = 0 } }, context = new { } })),
    };

    public static IEnumerable<object[]> CaseNames() => Cases.Keys.Select(k => new object[] { k });

    [Theory]
    [MemberData(nameof(CaseNames))]
    public async Task Answers_then_serves_the_next_request(string name)
    {
        await using var client = new RawLspClient();
        await client.StartAsync();
        string uri = Sheets.TempUri("hold.cutsheet");
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, Sheets.Hold));
        await client.DiagnosticsAsync(uri);

        await Cases[name](client, uri);

        var next = await client.RequestAsync("textDocument/hover", Sheets.At(uri, 7, 1));
        Assert.Contains("F_rim", (string?)next["result"]?["contents"]?["value"] ?? next.ToJsonString());
        Assert.DoesNotContain("   at ", client.Notifications.Select(n => n.ToJsonString()).FirstOrDefault(n => n.Contains("logMessage")) ?? "");
    }

    [Fact]
    public void The_corpus_has_at_least_thirty_cases() => Assert.True(Cases.Count >= 30, $"{Cases.Count} cases");
}
