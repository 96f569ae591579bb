namespace CutSheet.LanguageServer.Protocol;

/// <summary>The position encodings of LSP 3.17: how a position's character counts.</summary>
public static class PositionEncodings
{
    public const string Utf8 = "utf-8";
    public const string Utf16 = "utf-16";
    public const string Utf32 = "utf-32";
}
