namespace CutSheet.Cli;

/// <summary>
/// A problem with the command line or its input files (not with a sheet's content). It ends the
/// command with one line on standard error and exit code <see cref="ExitCodes.UsageOrInput"/>.
/// </summary>
public sealed class CliUsageException(string message) : Exception(message);
