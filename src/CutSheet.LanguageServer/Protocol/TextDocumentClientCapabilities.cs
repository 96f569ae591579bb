using System.Text.Json;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>The document features the client supports (only presence is read).</summary>
public sealed class TextDocumentClientCapabilities
{
    public JsonElement? InlayHint { get; set; }
    public JsonElement? CodeLens { get; set; }
}
