namespace CutSheet.Cli;

/// <summary>
/// Everything the command line takes from its process: the two output streams, the environment,
/// the working directory and whether standard output is a terminal. Tests pass their own.
/// </summary>
/// <param name="Out">Standard output: results, findings, help.</param>
/// <param name="Error">Standard error: one-line usage and I/O errors.</param>
/// <param name="Environment">Reads an environment variable; null when unset.</param>
/// <param name="WorkingDirectory">Relative paths on the command line and in the output are relative to this.</param>
/// <param name="OutputIsTerminal">True when <paramref name="Out"/> is an interactive terminal (colour is then allowed).</param>
public sealed record CliHost(
    TextWriter Out,
    TextWriter Error,
    Func<string, string?> Environment,
    string WorkingDirectory,
    bool OutputIsTerminal);
