namespace CutSheet.LanguageServer.Tests.Support;

/// <summary>Sheets and helpers shared by the server tests.</summary>
public static class Sheets
{
    public const string Hold = """
        use screws
        ## Hold
        F_axial = 1.1 kN
        P_h = lead(pitch: 5 mm)
        η′ = 0.9
        T_hold = F_axial * P_h * η′ / (2 * pi) as N·m
        r_grip = 60 mm
        F_rim = T_hold / r_grip as N
        check F_rim <= 25 N
        """;

    public static object Open(string uri, string text, int version = 1) =>
        new { textDocument = new { uri, languageId = "cutsheet", version, text } };

    public static object At(string uri, int line, int character) =>
        new { textDocument = new { uri }, position = new { line, character } };

    public static object Document(string uri) => new { textDocument = new { uri } };

    public static string TempUri(string name)
    {
        string folder = Path.Combine(Path.GetTempPath(), "cutsheet-lsp-tests", Guid.NewGuid().ToString("N")[..8]);
        Directory.CreateDirectory(folder);
        return new Uri(Path.Combine(folder, name)).AbsoluteUri;
    }
}
