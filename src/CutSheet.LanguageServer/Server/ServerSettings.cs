using System.Text.Json;
using CutSheet.Editing.Hints;

namespace CutSheet.LanguageServer.Server;

/// <summary>
/// The server's settings, from <c>initializationOptions</c> or the <c>cutsheet</c> section of
/// <c>workspace/didChangeConfiguration</c>:
/// <c>{"valueHints": {"enabled": true, "includeInputs": false}, "valueLenses": null}</c>.
/// <c>valueLenses</c> null means: lenses only for clients that cannot show inlay hints.
/// </summary>
public sealed record ServerSettings(HintOptions Hints, bool? Lenses)
{
    public static readonly ServerSettings Default = new(HintOptions.Default, null);

    /// <summary>Reads the settings object; missing or mistyped members keep their current value.</summary>
    public ServerSettings Merge(JsonElement? element)
    {
        if (element is not { ValueKind: JsonValueKind.Object } root) return this;
        if (root.TryGetProperty("cutsheet", out var section) && section.ValueKind == JsonValueKind.Object) root = section;
        var hints = Hints;
        bool? lenses = Lenses;
        if (root.TryGetProperty("valueHints", out var h) && h.ValueKind == JsonValueKind.Object)
        {
            if (h.TryGetProperty("enabled", out var e) && e.ValueKind is JsonValueKind.True or JsonValueKind.False) hints = hints with { Enabled = e.GetBoolean() };
            if (h.TryGetProperty("includeInputs", out var i) && i.ValueKind is JsonValueKind.True or JsonValueKind.False) hints = hints with { IncludeInputs = i.GetBoolean() };
        }
        if (root.TryGetProperty("valueLenses", out var l))
            lenses = l.ValueKind switch { JsonValueKind.True => true, JsonValueKind.False => false, JsonValueKind.Null => null, _ => lenses };
        return new ServerSettings(hints, lenses);
    }
}
