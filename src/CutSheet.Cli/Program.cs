using System.Text;

namespace CutSheet.Cli;

/// <summary>The process entry point: binds <see cref="CliApp"/> to the real console.</summary>
internal static class Program
{
    private static int Main(string[] args)
    {
        // The language server owns standard output: nothing may touch the console before it takes the stream.
        if (Commands.LspCommand.IsServerLaunch(args)) return Commands.LspCommand.RunOverStdio();
        // Units such as "N·m" and "µm" must reach the terminal intact whatever the platform's code page.
        Console.OutputEncoding = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false);
        var host = new CliHost(
            Console.Out,
            Console.Error,
            Environment.GetEnvironmentVariable,
            Environment.CurrentDirectory,
            OutputIsTerminal: !Console.IsOutputRedirected);
        return CliApp.Run(args, host);
    }
}
