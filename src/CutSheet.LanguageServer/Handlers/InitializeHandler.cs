using CutSheet.LanguageServer.Conversion;
using CutSheet.LanguageServer.Protocol;
using CutSheet.LanguageServer.Server;
using CutSheet.Language.Results;

namespace CutSheet.LanguageServer.Handlers;

/// <summary><c>initialize</c>: negotiates the position encoding, reads settings and the workspace root, lists the capabilities.</summary>
public sealed class InitializeHandler(ServerContext context) : IRequestHandler<InitializeParams, InitializeResult>
{
    public string Method => "initialize";

    public Task<InitializeResult?> HandleAsync(InitializeParams p, CancellationToken cancellation)
    {
        var state = context.State;
        state.Positions = new PositionMapper(PositionMapper.Negotiate(p.Capabilities?.General?.PositionEncodings));
        state.ClientShowsHints = p.Capabilities?.TextDocument?.InlayHint is not null;
        state.Settings = state.Settings.Merge(p.InitializationOptions);
        state.ClientRefreshesHints = p.Capabilities?.Workspace?.InlayHint?.RefreshSupport == true;
        state.ClientRefreshesLenses = p.Capabilities?.Workspace?.CodeLens?.RefreshSupport == true;
        state.ClientWatchesFiles = p.Capabilities?.Workspace?.DidChangeWatchedFiles?.DynamicRegistration == true;
        string? rootUri = p.WorkspaceFolders?.FirstOrDefault()?.Uri ?? p.RootUri;
        state.WorkspaceRoot = rootUri is not null ? DocumentUris.ToPath(rootUri) : p.RootPath;
        state.Phase = SessionPhase.Running;
        context.Log.Info(ServerMessages.Started(SheetResult.ToolVersion, state.Positions.Encoding));
        return Task.FromResult<InitializeResult?>(new InitializeResult
        {
            ServerInfo = new ServerInfo { Name = ServerMessages.ServerName, Version = SheetResult.ToolVersion },
            Capabilities = new ServerCapabilities
            {
                PositionEncoding = state.Positions.Encoding,
                TextDocumentSync = new TextDocumentSyncOptions { OpenClose = true, Change = ProtocolNumbers.IncrementalSync, Save = new SaveOptions { IncludeText = false } },
                HoverProvider = true,
                CompletionProvider = new CompletionOptions { TriggerCharacters = ["\\", "^", ".", " "], ResolveProvider = true },
                SignatureHelpProvider = new SignatureHelpOptions { TriggerCharacters = ["(", ","], RetriggerCharacters = [":"] },
                DefinitionProvider = true,
                ReferencesProvider = true,
                RenameProvider = new RenameOptions { PrepareProvider = true },
                DocumentSymbolProvider = true,
                SemanticTokensProvider = new SemanticTokensOptions
                {
                    Legend = new SemanticTokensLegend { TokenTypes = SemanticLegend.TokenTypes, TokenModifiers = SemanticLegend.TokenModifiers },
                    Full = true,
                },
                CodeActionProvider = new CodeActionOptions { CodeActionKinds = ["quickfix"] },
                DocumentFormattingProvider = true,
                FoldingRangeProvider = true,
                InlayHintProvider = true,
                CodeLensProvider = new CodeLensOptions { ResolveProvider = true },
            },
        });
    }
}
