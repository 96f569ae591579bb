namespace CutSheet.Cli.Tests.Support;

/// <summary>Runs <see cref="CliApp"/> in-process with captured output, a controlled environment and working directory.</summary>
public static class CliDriver
{
    public static CliOutcome Run(params string[] args) => Run(args, new Dictionary<string, string>(), Sheets.Directory, terminal: false);

    public static CliOutcome RunIn(string workingDirectory, params string[] args) =>
        Run(args, new Dictionary<string, string>(), workingDirectory, terminal: false);

    public static CliOutcome Run(string[] args, IReadOnlyDictionary<string, string> environment, string workingDirectory, bool terminal)
    {
        var stdout = new StringWriter { NewLine = "\n" };
        var stderr = new StringWriter { NewLine = "\n" };
        var host = new CliHost(stdout, stderr, name => environment.TryGetValue(name, out var v) ? v : null, workingDirectory, terminal);
        int exit = CliApp.Run(args, host);
        return new CliOutcome(exit, stdout.ToString(), stderr.ToString());
    }
}
