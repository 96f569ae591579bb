namespace CutSheet.LanguageServer.Protocol;

/// <summary>initialized carries nothing.</summary>
public sealed class InitializedParams
{
}
