using System.Diagnostics;
using CutSheet.Cli.Tests.Support;

namespace CutSheet.Cli.Tests;

/// <summary>The built <c>cutsheet</c> program, run as a child process with redirected output.</summary>
public sealed class ProcessTests
{
    private static (int ExitCode, string Out, string Error) Spawn(params string[] args)
    {
        string dll = Path.Combine(AppContext.BaseDirectory, "cutsheet.dll");
        Assert.True(File.Exists(dll), $"built program not found at {dll}");
        // The dotnet CLI tells child processes where its host is; fall back to the one on PATH.
        string dotnet = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host ? host : "dotnet";
        var start = new ProcessStartInfo(dotnet)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
            WorkingDirectory = Sheets.Directory,
        };
        start.ArgumentList.Add("exec");
        start.ArgumentList.Add(dll);
        foreach (string arg in args) start.ArgumentList.Add(arg);
        start.Environment.Remove("NO_COLOR"); // prove that redirection alone turns colour off
        using var process = Process.Start(start)!;
        var stdout = process.StandardOutput.ReadToEndAsync();
        var stderr = process.StandardError.ReadToEndAsync();
        Assert.True(process.WaitForExit(60_000), "cutsheet did not finish within a minute");
        return (process.ExitCode, stdout.Result, stderr.Result);
    }

    [Fact]
    public void Redirected_output_is_plain_text()
    {
        var (exit, stdout, stderr) = Spawn("run", "demo.cutsheet");
        Assert.Equal(0, exit);
        Assert.Equal("", stderr);
        Assert.DoesNotContain('\u001b', stdout);
        Assert.Contains("# Demo", stdout);
        Assert.Contains("N·m", stdout); // UTF-8 on the wire
    }

    [Fact]
    public void Exit_codes_reach_the_shell()
    {
        Assert.Equal(1, Spawn("check", "unit-error.cutsheet").ExitCode);
        var (exit, stdout, stderr) = Spawn("run", "missing.cutsheet");
        Assert.Equal(2, exit);
        Assert.Equal("", stdout);
        Assert.StartsWith("cutsheet: error: ", stderr);
    }
}
