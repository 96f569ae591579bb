using CutSheet.Language.Results;

namespace CutSheet.Cli;

/// <summary>The tool's identity as written into version output, JSON and SARIF.</summary>
public static class ToolInfo
{
    /// <summary>The tool name, as SARIF's <c>tool.driver.name</c>.</summary>
    public const string Name = CliApp.CommandName;

    /// <summary>
    /// Where users read about the tool and its diagnostic codes (SARIF <c>informationUri</c>).
    /// The project has no published home yet; this is the one place to change when it has.
    /// </summary>
    public const string InformationUri = "https://github.com/cutsheet/cutsheet";

    /// <summary>The version of the language and its library sheets, which is the version of the tool.</summary>
    public static string Version => SheetResult.ToolVersion;
}
