using System.Text.Json.Serialization;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>A command of a code lens; an empty command makes the lens a plain label.</summary>
public sealed class Command
{
    public string Title { get; set; } = "";
    [JsonPropertyName("command")]
    public string CommandName { get; set; } = "";
}
