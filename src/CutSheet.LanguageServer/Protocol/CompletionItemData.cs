using System.Text.Json;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>
/// What a completion item carries for <c>completionItem/resolve</c>: the document it was made
/// for, what the item is (a completion category's name), its name, and the alias of the
/// imported sheet it was reached through, if any. Small on purpose: it travels with every item.
/// </summary>
public sealed class CompletionItemData
{
    public string Uri { get; set; } = "";
    public string Category { get; set; } = "";
    public string Name { get; set; } = "";
    public string? Alias { get; set; }

    /// <summary>Reads the data a client sent back; false for anything that is not such an object.</summary>
    public static bool TryRead(object? data, out CompletionItemData read)
    {
        read = new CompletionItemData();
        if (data is CompletionItemData own) { read = own; return true; }
        if (data is not JsonElement { ValueKind: JsonValueKind.Object } json) return false;
        if (Text(json, "uri") is not { } uri || Text(json, "category") is not { } category || Text(json, "name") is not { } name) return false;
        read = new CompletionItemData { Uri = uri, Category = category, Name = name, Alias = Text(json, "alias") };
        return true;
    }

    private static string? Text(JsonElement json, string property) =>
        json.TryGetProperty(property, out var value) && value.ValueKind == JsonValueKind.String ? value.GetString() : null;
}
