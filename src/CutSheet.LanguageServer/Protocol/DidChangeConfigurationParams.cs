using System.Text.Json;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>workspace/didChangeConfiguration.</summary>
public sealed class DidChangeConfigurationParams
{
    public JsonElement? Settings { get; set; }
}
