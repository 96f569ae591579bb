using CutSheet.Editing.Signatures;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>textDocument/signatureHelp</c>.</summary>
public sealed class SignatureHelpHandler(ServerContext context) : IRequestHandler<TextDocumentPositionParams, SignatureHelp>
{
    public string Method => "textDocument/signatureHelp";

    public async Task<SignatureHelp?> HandleAsync(TextDocumentPositionParams p, CancellationToken cancellation)
    {
        var (_, analysis) = await context.AnalysisAsync(p.TextDocument.Uri, cancellation).ConfigureAwait(false);
        var help = SignatureHelpProvider.Help(analysis, context.Positions.ToOffset(analysis.Source, p.Position));
        if (help is null) return null;
        return new SignatureHelp
        {
            Signatures =
            [
                new SignatureInformation
                {
                    Label = help.Label,
                    Documentation = help.Documentation is null ? null : new MarkupContent { Value = help.Documentation },
                    Parameters = help.Parameters.Select(x => new ParameterInformation { Label = x }).ToArray(),
                    ActiveParameter = help.ActiveParameter,
                },
            ],
            ActiveSignature = 0,
            ActiveParameter = help.ActiveParameter,
        };
    }
}
