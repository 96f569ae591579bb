namespace CutSheet.LanguageServer.Protocol;

/// <summary>
/// One completion. <see cref="Data"/> is kept by the client and sent back with
/// <c>completionItem/resolve</c>: the server writes a <see cref="CompletionItemData"/>, and reads
/// back whatever JSON arrives (a <see cref="System.Text.Json.JsonElement"/>), so that a client's
/// odd data cannot fail the request.
/// </summary>
public sealed class CompletionItem
{
    public string Label { get; set; } = "";
    public int? Kind { get; set; }
    public string? Detail { get; set; }
    public MarkupContent? Documentation { get; set; }
    public string? SortText { get; set; }
    public string? FilterText { get; set; }
    public TextEdit? TextEdit { get; set; }

    /// <summary>Edits elsewhere in the document made when the item is chosen (the import of a library name).</summary>
    public TextEdit[]? AdditionalTextEdits { get; set; }
    public object? Data { get; set; }
}
