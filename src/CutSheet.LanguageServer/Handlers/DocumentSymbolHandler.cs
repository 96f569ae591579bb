using CutSheet.Editing.Outline;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;
using CutSheet.Language.Text;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/documentSymbol</c>: sections (headings) holding definitions, functions and checks.</summary>
public sealed class DocumentSymbolHandler(ServerContext context) : IRequestHandler<TextDocumentParams, DocumentSymbol[]>
{
    public string Method => "textDocument/documentSymbol";

    public async Task<DocumentSymbol[]?> HandleAsync(TextDocumentParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        return OutlineProvider.Outline(analysis).Select(i => Convert(i, analysis.Source)).ToArray();
    }

    private DocumentSymbol Convert(OutlineItem item, SourceText text) => new()
    {
        Name = item.Name.Length == 0 ? "(untitled)" : item.Name,
        Detail = item.Detail,
        Kind = item.Category switch
        {
            OutlineCategory.Section => ProtocolNumbers.SymbolNamespace,
            OutlineCategory.Function => ProtocolNumbers.SymbolFunction,
            OutlineCategory.Check => ProtocolNumbers.SymbolBoolean,
            OutlineCategory.Choice => ProtocolNumbers.SymbolEnum,
            OutlineCategory.Table => ProtocolNumbers.SymbolStruct,
            OutlineCategory.Kind => ProtocolNumbers.SymbolTypeParameter,
            OutlineCategory.Import => ProtocolNumbers.SymbolModule,
            _ => ProtocolNumbers.SymbolVariable,
        },
        Range = context.Positions.ToRange(text, item.Span),
        SelectionRange = context.Positions.ToRange(text, item.SelectionSpan),
        Children = item.Children.Count == 0 ? null : item.Children.Select(c => Convert(c, text)).ToArray(),
    };
}
