namespace CutSheet.Cli.Tests.Support;

/// <summary>What one in-process run of the command line produced.</summary>
public sealed record CliOutcome(int ExitCode, string Out, string Error)
{
    public override string ToString() => $"exit {ExitCode}\n--- stdout ---\n{Out}\n--- stderr ---\n{Error}";
}
