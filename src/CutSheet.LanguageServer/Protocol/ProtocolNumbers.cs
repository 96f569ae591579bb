namespace CutSheet.LanguageServer.Protocol;

/// <summary>The protocol's numbered enumerations, only the members the server sends.</summary>
public static class ProtocolNumbers
{
    // DiagnosticSeverity
    public const int Error = 1, Warning = 2, Information = 3, Hint = 4;

    // TextDocumentSyncKind
    public const int IncrementalSync = 2;

    // MessageType
    public const int LogError = 1, LogWarning = 2, LogInfo = 3;

    // SymbolKind
    public const int SymbolNamespace = 3, SymbolClass = 5, SymbolEnum = 10, SymbolFunction = 12, SymbolVariable = 13,
        SymbolBoolean = 17, SymbolStruct = 23, SymbolModule = 2, SymbolTypeParameter = 26;

    // CompletionItemKind
    public const int CompletionFunction = 3, CompletionVariable = 6, CompletionClass = 7, CompletionModule = 9, CompletionUnit = 11,
        CompletionKeyword = 14, CompletionText = 1, CompletionEnumMember = 20, CompletionConstant = 21, CompletionStruct = 22,
        CompletionEnum = 13, CompletionTypeParameter = 25;
}
