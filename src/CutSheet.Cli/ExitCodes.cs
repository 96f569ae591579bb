namespace CutSheet.Cli;

/// <summary>The process exit codes of every command; <c>--help</c> of each command repeats them.</summary>
public static class ExitCodes
{
    /// <summary>The sheets are clean: no error, no failed or unevaluated check (and, when asked, no caution).</summary>
    public const int Clean = 0;

    /// <summary>The sheets were read and evaluated, and something in them fails the run.</summary>
    public const int Findings = 1;

    /// <summary>The command could not do its job: bad usage, a missing or unreadable file, an internal failure.</summary>
    public const int UsageOrInput = 2;
}
