using System.Diagnostics;
using System.Globalization;
using System.Text.Json;

namespace CutSheet.Bench;

/// <summary>
/// pint in a Python process of its own that evaluates the generated body once per request
/// (the line protocol is described in <c>pint_chain.py</c>), so that the harness can time
/// CutSheet right before and right after each pint run.
/// </summary>
internal sealed class PintSession : IDisposable
{
    private readonly Process _process;

    private PintSession(Process process, JsonElement hello, double startMs)
    {
        _process = process;
        Version = hello.GetProperty("pint").GetString()!;
        Python = hello.GetProperty("python").GetString()!;
        ImportMs = hello.GetProperty("import_s").GetDouble() * 1000;
        CompileMs = hello.GetProperty("compile_s").GetDouble() * 1000;
        StartMs = startMs;
    }

    public string Version { get; }
    public string Python { get; }

    /// <summary><c>import pint</c> and <c>UnitRegistry()</c>, timed inside Python.</summary>
    public double ImportMs { get; }

    /// <summary>Compiling the 10,000-line Python body.</summary>
    public double CompileMs { get; }

    /// <summary>From starting the process to its first answer.</summary>
    public double StartMs { get; }

    /// <summary>Starts Python with the script; null (and the reason written out) when that fails.</summary>
    public static PintSession? Start(string script, string body)
    {
        var psi = new ProcessStartInfo("/usr/bin/python3")
        {
            RedirectStandardInput = true, RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false,
        };
        psi.ArgumentList.Add(script);
        psi.ArgumentList.Add(body);
        var sw = Stopwatch.StartNew();
        Process p;
        try { p = Process.Start(psi)!; }
        catch (Exception ex) { Console.WriteLine($"pint: cannot start /usr/bin/python3: {ex.Message}"); return null; }
        string? first = p.StandardOutput.ReadLine();
        if (first is null)
        {
            p.WaitForExit();
            Console.WriteLine($"pint failed (apt-get install python3-pint): {p.StandardError.ReadToEnd().Trim()}");
            p.Dispose();
            return null;
        }
        using var hello = JsonDocument.Parse(first);
        return new PintSession(p, hello.RootElement.Clone(), sw.Elapsed.TotalMilliseconds);
    }

    /// <summary>One evaluation of the body: wall and thread CPU time in milliseconds, timed inside Python.</summary>
    public (double WallMs, double CpuMs) RunOnce()
    {
        var e = Ask("run");
        return (e.GetProperty("run_s").GetDouble() * 1000, e.GetProperty("cpu_s").GetDouble() * 1000);
    }

    /// <summary>Ends the session: the final x (m) and F (N) of the last run.</summary>
    public (double X, double F) End()
    {
        var e = Ask("end");
        _process.WaitForExit();
        return (e.GetProperty("x_m").GetDouble(), e.GetProperty("F_N").GetDouble());
    }

    private JsonElement Ask(string command)
    {
        _process.StandardInput.WriteLine(command);
        _process.StandardInput.Flush();
        string line = _process.StandardOutput.ReadLine()
            ?? throw new InvalidOperationException($"pint stopped: {_process.StandardError.ReadToEnd().Trim()}");
        using var doc = JsonDocument.Parse(line);
        return doc.RootElement.Clone();
    }

    public void Dispose()
    {
        if (!_process.HasExited) _process.Kill();
        _process.Dispose();
    }

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"pint {Version} (Python {Python})");
}
