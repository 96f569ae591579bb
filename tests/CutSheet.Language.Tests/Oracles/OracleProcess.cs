using System.ComponentModel;
using System.Diagnostics;

namespace CutSheet.Language.Tests.Oracles;

/// <summary>Runs an oracle program with text on stdin; a missing program is an error naming the Debian package to install.</summary>
public static class OracleProcess
{
    /// <summary>Generous: a cold start of python with pint takes about a second on a 2-core machine.</summary>
    private static readonly TimeSpan Timeout = TimeSpan.FromSeconds(60);

    public sealed record Output(int ExitCode, string StdOut, string StdErr);

    public static Output Run(string program, IEnumerable<string> arguments, string stdin, string package)
    {
        var info = new ProcessStartInfo(program)
        {
            RedirectStandardInput = true,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            StandardInputEncoding = new System.Text.UTF8Encoding(false),
            StandardOutputEncoding = System.Text.Encoding.UTF8,
        };
        foreach (var a in arguments) info.ArgumentList.Add(a);
        // C locale: the oracles print with a decimal point whatever culture the tests run under.
        info.Environment["LC_ALL"] = "C.UTF-8";
        Process process;
        try
        {
            process = Process.Start(info) ?? throw new InvalidOperationException($"could not start {program}");
        }
        catch (Win32Exception e)
        {
            throw new OracleMissingException(program, package, e.Message);
        }
        using (process)
        {
            // Read both streams while writing, so a full pipe cannot deadlock either side.
            var stdout = process.StandardOutput.ReadToEndAsync();
            var stderr = process.StandardError.ReadToEndAsync();
            process.StandardInput.Write(stdin);
            process.StandardInput.Close();
            if (!process.WaitForExit(Timeout))
            {
                process.Kill(entireProcessTree: true);
                throw new TimeoutException($"{program} did not finish within {Timeout.TotalSeconds} s");
            }
            return new Output(process.ExitCode, stdout.Result, stderr.Result);
        }
    }
}
