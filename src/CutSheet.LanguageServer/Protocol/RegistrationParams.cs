namespace CutSheet.LanguageServer.Protocol;

/// <summary>client/registerCapability.</summary>
public sealed class RegistrationParams
{
    public Registration[] Registrations { get; set; } = [];
}
