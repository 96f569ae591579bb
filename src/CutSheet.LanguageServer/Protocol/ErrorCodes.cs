namespace CutSheet.LanguageServer.Protocol;

/// <summary>JSON-RPC and LSP error codes the server answers with.</summary>
public static class ErrorCodes
{
    public const int ParseError = -32700;
    public const int InvalidRequest = -32600;
    public const int InvalidParams = -32602;
    public const int InternalError = -32603;
    public const int ServerNotInitialized = -32002;
    public const int RequestFailed = -32803;
}
