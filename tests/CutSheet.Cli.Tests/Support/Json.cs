using System.Text.Json;

namespace CutSheet.Cli.Tests.Support;

/// <summary>Parses command output as JSON for assertions.</summary>
public static class Json
{
    public static JsonElement Parse(string text)
    {
        using var document = JsonDocument.Parse(text);
        return document.RootElement.Clone();
    }

    public static JsonElement Statement(JsonElement run, string name) =>
        run.GetProperty("statements").EnumerateArray()
            .Single(s => s.GetProperty("kind").GetString() == "definition" && s.GetProperty("name").GetString() == name);
}
