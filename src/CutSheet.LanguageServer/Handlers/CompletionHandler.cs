using CutSheet.Editing.Completion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary>
/// <c>textDocument/completion</c>: every item replaces the partly typed word with a text edit.
/// The list is filtered, ranked and capped by the editing layer (incomplete when cut); items
/// with more to show carry data for <see cref="CompletionResolveHandler"/>.
/// </summary>
public sealed class CompletionHandler(ServerContext context) : IRequestHandler<CompletionParams, CompletionList>
{
    public string Method => "textDocument/completion";

    public async Task<CompletionList?> HandleAsync(CompletionParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var result = CompletionProvider.Complete(analysis, context.Positions.ToOffset(analysis.Source, p.Position), p.Context?.TriggerCharacter);
        return new CompletionList
        {
            IsIncomplete = result.IsIncomplete,
            Items = result.Items.Select(i => new CompletionItem
            {
                Label = i.Label,
                Kind = KindOf(i.Category),
                Detail = i.Detail,
                Documentation = i.Documentation is null ? null : new MarkupContent { Value = i.Documentation },
                SortText = i.SortText,
                FilterText = i.FilterText,
                TextEdit = new TextEdit { Range = context.Positions.ToRange(analysis.Source, i.Replace), NewText = i.InsertText },
                AdditionalTextEdits = i.AdditionalEdits?.Select(e => new TextEdit { Range = context.Positions.ToRange(analysis.Source, e.Span), NewText = e.NewText }).ToArray(),
                Data = i.Key is { } key ? new CompletionItemData { Uri = p.TextDocument.Uri, Category = key.Category.ToString(), Name = key.Name, Alias = key.Alias } : null,
            }).ToArray(),
        };
    }

    private static int KindOf(CompletionCategory category) => category switch
    {
        CompletionCategory.Definition => ProtocolNumbers.CompletionVariable,
        CompletionCategory.Function => ProtocolNumbers.CompletionFunction,
        CompletionCategory.Option => ProtocolNumbers.CompletionEnumMember,
        CompletionCategory.Table => ProtocolNumbers.CompletionStruct,
        CompletionCategory.Choice => ProtocolNumbers.CompletionEnum,
        CompletionCategory.Kind => ProtocolNumbers.CompletionClass,
        CompletionCategory.Namespace => ProtocolNumbers.CompletionModule,
        CompletionCategory.Constant => ProtocolNumbers.CompletionConstant,
        CompletionCategory.Unit => ProtocolNumbers.CompletionUnit,
        CompletionCategory.Keyword => ProtocolNumbers.CompletionKeyword,
        CompletionCategory.Parameter => ProtocolNumbers.CompletionTypeParameter,
        _ => ProtocolNumbers.CompletionText,
    };
}
