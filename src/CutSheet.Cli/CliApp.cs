using System.CommandLine;
using CutSheet.Cli.Commands;

namespace CutSheet.Cli;

/// <summary>
/// The <c>cutsheet</c> command line as a function: arguments and a host in, exit code out.
/// It never throws: usage and input problems, and any unexpected failure, become one line on
/// standard error and exit code <see cref="ExitCodes.UsageOrInput"/>.
/// </summary>
public static class CliApp
{
    /// <summary>The command's name, as typed and as it prefixes error lines.</summary>
    public const string CommandName = "cutsheet";

    /// <summary>Runs with the given writers and environment, in the process's working directory, without colour.</summary>
    public static int Run(string[] args, TextWriter stdout, TextWriter stderr, Func<string, string?> env) =>
        Run(args, new CliHost(stdout, stderr, env, Environment.CurrentDirectory, OutputIsTerminal: false));

    /// <summary>Runs the command line against <paramref name="host"/>; returns the exit code.</summary>
    public static int Run(string[] args, CliHost host)
    {
        ArgumentNullException.ThrowIfNull(args);
        ArgumentNullException.ThrowIfNull(host);
        try
        {
            var root = CommandTree.Build(host);
            // A sheet path may start with '@'; response files would silently read it as a list of arguments.
            var parse = root.Parse(args, new ParserConfiguration { ResponseFileTokenReplacer = null });
            bool errorsStand = parse.Errors.Count > 0 && parse.Action is not { ClearsParseErrors: true };
            if (errorsStand)
            {
                WriteError(host, ParseErrorText.Describe(parse));
                return ExitCodes.UsageOrInput;
            }
            // The default handler would print a stack trace; ours below prints one line.
            return parse.Invoke(new InvocationConfiguration { Output = host.Out, Error = host.Error, EnableDefaultExceptionHandler = false });
        }
        catch (CliUsageException e)
        {
            WriteError(host, e.Message);
            return ExitCodes.UsageOrInput;
        }
        catch (Exception e)
        {
            // A bug in the tool, or an output stream that went away: still one line and a defined exit code.
            WriteError(host, $"unexpected failure ({e.GetType().Name}): {OneLine(e.Message)}");
            return ExitCodes.UsageOrInput;
        }
        finally
        {
            TryFlush(host.Out);
        }
    }

    /// <summary>Writes <c>cutsheet: error: MESSAGE</c> as one line on standard error.</summary>
    internal static void WriteError(CliHost host, string message)
    {
        try
        {
            host.Error.WriteLine($"{CommandName}: error: {OneLine(message)}");
            host.Error.Flush();
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException)
        {
            // Nowhere left to report to; the exit code still says what happened.
        }
    }

    /// <summary>Collapses line breaks and tabs so that a message stays on one line.</summary>
    internal static string OneLine(string text) =>
        string.Join(' ', text.Split(['\r', '\n', '\t'], StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries));

    private static void TryFlush(TextWriter writer)
    {
        try
        {
            writer.Flush();
        }
        catch (Exception e) when (e is IOException or ObjectDisposedException)
        {
            // A closed pipe (e.g. `| head`) is not worth a second error.
        }
    }
}
