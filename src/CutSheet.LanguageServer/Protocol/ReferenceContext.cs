namespace CutSheet.LanguageServer.Protocol;

/// <summary>Whether references include the declaration.</summary>
public sealed class ReferenceContext
{
    public bool IncludeDeclaration { get; set; }
}
