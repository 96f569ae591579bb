namespace CutSheet.Cli.Commands;

/// <summary>The exit-code paragraphs of the help texts, kept next to each other so they stay consistent.</summary>
internal static class ExitCodeHelp
{
    public const string Common =
        "Exit codes:\n" +
        "  0  success\n" +
        "  1  a sheet has findings that fail the command (see the command's help)\n" +
        "  2  usage error, or a file or directory could not be read";

    public const string Run =
        "Exit codes:\n" +
        "  0  no errors, and every check passed\n" +
        "  1  the sheet has an error, or a check failed or could not be evaluated\n" +
        "  2  usage error (bad option, malformed --set), or the file could not be read";

    public const string Check =
        "Exit codes:\n" +
        "  0  nothing fails at the --fail-on level\n" +
        "  1  an error in any sheet, including a failed or not evaluated check;\n" +
        "     with --fail-on caution also any warning or unaccepted caution (CUT4101-CUT4104)\n" +
        "  2  usage error, a missing or unreadable path, or a directory without *.cutsheet files";
}
