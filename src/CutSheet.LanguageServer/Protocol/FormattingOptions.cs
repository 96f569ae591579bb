namespace CutSheet.LanguageServer.Protocol;

/// <summary>Formatting options; the sheet formatter keeps the sheet's own spacing rules.</summary>
public sealed class FormattingOptions
{
    public int TabSize { get; set; }
    public bool InsertSpaces { get; set; }
}
