namespace CutSheet.LanguageServer.Protocol;

/// <summary>Whether the client accepts a feature registered at run time.</summary>
public sealed class DynamicRegistrationCapability
{
    public bool DynamicRegistration { get; set; }
}
