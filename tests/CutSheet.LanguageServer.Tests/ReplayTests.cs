using System.Text;
using System.Text.Json.Nodes;
using CutSheet.Language;
using CutSheet.LanguageServer.Tests.Support;

namespace CutSheet.LanguageServer.Tests;

/// <summary>
/// Many random incremental edits, sent as a client would; the diagnostics after the last edit
/// must equal those of a fresh evaluation of the final text. Positions are computed here,
/// independently of the server, in the negotiated encoding (Greek letters and '·' make
/// UTF-8 and UTF-16 columns differ).
/// </summary>
public sealed class ReplayTests
{
    private static readonly string[] Snippets =
    [
        "η", "·", "λ = 5 deg\n", " mm", " kN", "\n", "+ 2 N", " * ", "F_rim", "(", ")", "check F_rim <= 20 N\n",
        "T = 2 N·m", "x = 3 kg + 1 m\n", "// note", "\"", "µm", "1,5", "as lbf", "# Head\n", "lead(pitch: 2 mm)",
    ];

    [Theory]
    [InlineData("utf-16", 11)]
    [InlineData("utf-8", 12)]
    [InlineData("utf-32", 13)]
    public async Task Diagnostics_after_random_edits_equal_a_fresh_evaluation(string encoding, int seed)
    {
        await using var client = new RawLspClient();
        var init = await client.InitializeAsync(capabilities: new { general = new { positionEncodings = new[] { encoding } } });
        Assert.Equal(encoding, (string?)init["result"]!["capabilities"]!["positionEncoding"]);
        await client.NotifyAsync("initialized", new { });
        string uri = Sheets.TempUri("replay.cutsheet");
        string path = new Uri(uri).LocalPath;
        string text = Sheets.Hold;
        await client.NotifyAsync("textDocument/didOpen", Sheets.Open(uri, text));

        var random = new Random(seed);
        int version = 1;
        for (int i = 0; i < 200; i++)
        {
            int start = random.Next(text.Length + 1);
            while (start > 0 && start < text.Length && char.IsLowSurrogate(text[start])) start--;
            int end = Math.Min(text.Length, start + (random.Next(3) == 0 ? random.Next(8) : 0));
            string insert = random.Next(4) == 0 ? "" : Snippets[random.Next(Snippets.Length)];
            var change = new { range = new { start = PositionOf(text, start, encoding), end = PositionOf(text, end, encoding) }, text = insert };
            text = text[..start] + insert + text[end..];
            await client.NotifyAsync("textDocument/didChange", new { textDocument = new { uri, version = ++version }, contentChanges = new[] { change } });
        }

        var published = await client.DiagnosticsAsync(uri, p => (int?)p["version"] == version, TimeSpan.FromSeconds(30));
        var expected = SheetRunner.Run(text, path).Diagnostics.Where(d => d.Path is null)
            .Select(d => $"{d.Code} {Describe(text, d.Span.Start, encoding)}-{Describe(text, d.Span.End, encoding)} {d.Message}").ToList();
        var actual = published["diagnostics"]!.AsArray()
            .Select(d => $"{(string?)d!["code"]} {(int)d["range"]!["start"]!["line"]!}:{(int)d["range"]!["start"]!["character"]!}-{(int)d["range"]!["end"]!["line"]!}:{(int)d["range"]!["end"]!["character"]!} {(string?)d["message"]}")
            .ToList();
        Assert.NotEmpty(expected); // the seeds leave errors in the final text, so the comparison means something
        Assert.Equal(expected, actual);
        var symbols = await client.RequestAsync("textDocument/documentSymbol", Sheets.Document(uri));
        Assert.True(symbols.ContainsKey("result"));
    }

    private static object PositionOf(string text, int offset, string encoding)
    {
        var (line, character) = Split(text, offset, encoding);
        return new { line, character };
    }

    private static string Describe(string text, int offset, string encoding)
    {
        var (line, character) = Split(text, offset, encoding);
        return $"{line}:{character}";
    }

    /// <summary>Line and character of an offset, counted from scratch: lines split at '\n' only (the replay inserts no '\r').</summary>
    private static (int Line, int Character) Split(string text, int offset, string encoding)
    {
        int lineStart = text.LastIndexOf('\n', Math.Max(0, offset - 1)) + 1;
        if (offset == 0) lineStart = 0;
        int line = text[..lineStart].Count(c => c == '\n');
        string prefix = text[lineStart..offset];
        int character = encoding switch
        {
            "utf-8" => Encoding.UTF8.GetByteCount(prefix),
            "utf-32" => prefix.EnumerateRunes().Count(),
            _ => prefix.Length,
        };
        return (line, character);
    }
}
