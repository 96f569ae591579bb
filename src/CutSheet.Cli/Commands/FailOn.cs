namespace CutSheet.Cli.Commands;

/// <summary>The lowest kind of finding that makes <c>cutsheet check</c> exit with 1.</summary>
public enum FailOn
{
    /// <summary>Errors only, which include failed and not evaluated checks.</summary>
    Error,

    /// <summary>Errors, warnings, and every caution that the sheet has not accepted with a reason.</summary>
    Caution,
}
