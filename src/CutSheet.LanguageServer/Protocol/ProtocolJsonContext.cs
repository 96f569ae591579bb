using System.Text.Json.Serialization;

namespace CutSheet.LanguageServer.Protocol;

/// <summary>
/// Source-generated JSON metadata for every protocol type the server reads or writes, and for
/// the two StreamJsonRpc types it must serialise itself: error data (else the first handler
/// error closes the connection) and request ids (else <c>$/cancelRequest</c> is ignored).
/// Naming (camelCase) and null handling are set on the formatter's options, not here.
/// </summary>
[JsonSerializable(typeof(InitializeParams))]
[JsonSerializable(typeof(InitializeResult))]
[JsonSerializable(typeof(InitializedParams))]
[JsonSerializable(typeof(DidOpenTextDocumentParams))]
[JsonSerializable(typeof(DidChangeTextDocumentParams))]
[JsonSerializable(typeof(DidCloseTextDocumentParams))]
[JsonSerializable(typeof(DidSaveTextDocumentParams))]
[JsonSerializable(typeof(DidChangeConfigurationParams))]
[JsonSerializable(typeof(TextDocumentPositionParams))]
[JsonSerializable(typeof(CompletionParams))]
[JsonSerializable(typeof(ReferenceParams))]
[JsonSerializable(typeof(RenameParams))]
[JsonSerializable(typeof(TextDocumentParams))]
[JsonSerializable(typeof(RangeParams))]
[JsonSerializable(typeof(DocumentFormattingParams))]
[JsonSerializable(typeof(CodeActionParams))]
[JsonSerializable(typeof(Hover))]
[JsonSerializable(typeof(CompletionList))]
[JsonSerializable(typeof(CompletionItem))]
[JsonSerializable(typeof(CompletionItemData))]
[JsonSerializable(typeof(System.Text.Json.JsonElement))]
[JsonSerializable(typeof(SignatureHelp))]
[JsonSerializable(typeof(Location))]
[JsonSerializable(typeof(Location[]))]
[JsonSerializable(typeof(PrepareRenameResult))]
[JsonSerializable(typeof(WorkspaceEdit))]
[JsonSerializable(typeof(DocumentSymbol[]))]
[JsonSerializable(typeof(SemanticTokens))]
[JsonSerializable(typeof(CodeAction[]))]
[JsonSerializable(typeof(TextEdit[]))]
[JsonSerializable(typeof(FoldingRange[]))]
[JsonSerializable(typeof(InlayHint[]))]
[JsonSerializable(typeof(CodeLens[]))]
[JsonSerializable(typeof(PublishDiagnosticsParams))]
[JsonSerializable(typeof(LogMessageParams))]
[JsonSerializable(typeof(RegistrationParams))]
[JsonSerializable(typeof(DidChangeWatchedFilesParams))]
[JsonSerializable(typeof(object))]
[JsonSerializable(typeof(StreamJsonRpc.Protocol.CommonErrorData))]
[JsonSerializable(typeof(StreamJsonRpc.RequestId))]
internal sealed partial class ProtocolJsonContext : JsonSerializerContext;
