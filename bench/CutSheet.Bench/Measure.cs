using System.Diagnostics;

namespace CutSheet.Bench;

/// <summary>A timing: the median and the fastest of the runs, and bytes allocated per run.</summary>
internal readonly record struct Timing(double MedianMs, double MinMs, double AllocatedBytes, int Runs,
    double GcPauseMs = 0, double Gen0 = 0, double Gen1 = 0, double Gen2 = 0, double CpuMs = double.NaN)
{
    public string GcText => $"{GcPauseMs:F1} ms ({Gen0:0.#}/{Gen1:0.#}/{Gen2:0.#})";

    public double PerLineUs(int lines) => MedianMs * 1000 / lines;
}

/// <summary>
/// Warm-up, then the median of several runs. The warm-up lasts long enough for tiered JIT to
/// have compiled the hot methods at full optimisation (its background tier-up waits ~100 ms).
/// </summary>
internal static class Measure
{
    public static double Sink;

    /// <summary>Print every run's time (--raw).</summary>
    public static bool Raw;

    /// <summary>
    /// Warm-up, then <paramref name="runs"/> timed runs. The warm-up lasts at least
    /// <paramref name="warmupSeconds"/> and goes on (up to 30 s) while the CPU time per call still
    /// falls: on a busy machine the JIT's background thread that installs optimised code can lag.
    /// </summary>
    public static Timing Run(Func<double> body, int runs, double warmupSeconds = 1.0, int minWarmup = 3, int inner = 1)
    {
        var warm = Stopwatch.StartNew();
        var history = new List<double>();
        for (int i = 0; ; i++)
        {
            double c0 = ThreadCpuMs();
            for (int k = 0; k < inner; k++) Sink += body();
            history.Add(ThreadCpuMs() - c0);
            if (i + 1 < minWarmup || warm.Elapsed.TotalSeconds < warmupSeconds) continue;
            if (warm.Elapsed.TotalSeconds > 30 || history.Count < 10) { if (warm.Elapsed.TotalSeconds > 30) break; continue; }
            // Settled when the best of the last five calls is no better than the best of the five before.
            double last = history.TakeLast(5).Min(), before = history.SkipLast(5).TakeLast(5).Min();
            if (last >= 0.97 * before) break;
        }
        return Timed(body, runs, inner);
    }

    /// <summary><paramref name="runs"/> timed runs with no warm-up, each after a full collection.</summary>
    public static Timing Timed(Func<double> body, int runs, int inner = 1)
    {
        var times = new double[runs];
        var cpu = new double[runs];
        double alloc = 0, pause = 0, g0 = 0, g1 = 0, g2 = 0;
        for (int r = 0; r < runs; r++)
        {
            GC.Collect();
            GC.WaitForPendingFinalizers();
            GC.Collect();
            long a0 = GC.GetAllocatedBytesForCurrentThread();
            var p0 = GC.GetTotalPauseDuration();
            int c0 = GC.CollectionCount(0), c1 = GC.CollectionCount(1), c2 = GC.CollectionCount(2);
            double cpu0 = ThreadCpuMs();
            long t0 = Stopwatch.GetTimestamp();
            for (int k = 0; k < inner; k++) Sink += body();
            long t1 = Stopwatch.GetTimestamp();
            cpu[r] = (ThreadCpuMs() - cpu0) / inner;
            pause += (GC.GetTotalPauseDuration() - p0).TotalMilliseconds / inner;
            g0 += (GC.CollectionCount(0) - c0) / (double)inner;
            g1 += (GC.CollectionCount(1) - c1) / (double)inner;
            g2 += (GC.CollectionCount(2) - c2) / (double)inner;
            alloc += (GC.GetAllocatedBytesForCurrentThread() - a0) / (double)inner;
            times[r] = (t1 - t0) * 1000.0 / Stopwatch.Frequency / inner;
        }
        if (Raw) Console.Error.WriteLine($"  raw ms: {string.Join(" ", times.Select(t => t.ToString("F2", System.Globalization.CultureInfo.InvariantCulture)))}");
        Array.Sort(times);
        Array.Sort(cpu);
        return new Timing(Median(times), times[0], alloc / runs, runs, pause / runs, g0 / runs, g1 / runs, g2 / runs, Median(cpu));
    }

    public static double Median(double[] sorted)
    {
        int n = sorted.Length;
        return n % 2 == 1 ? sorted[n / 2] : (sorted[n / 2 - 1] + sorted[n / 2]) / 2;
    }

    /// <summary>Wall time of a fresh process from start to exit (output read and discarded).</summary>
    public static Timing Process(string file, IReadOnlyList<string> args, string workingDirectory, int runs, int warmup = 1,
        IReadOnlyDictionary<string, string>? environment = null)
    {
        var times = new List<double>();
        var cpu = new List<double>();
        for (int r = 0; r < warmup + runs; r++)
        {
            double cpu0 = ChildrenCpuMs();
            var psi = new ProcessStartInfo(file)
            {
                WorkingDirectory = workingDirectory,
                RedirectStandardOutput = true,
                RedirectStandardError = true,
                UseShellExecute = false,
            };
            foreach (var a in args) psi.ArgumentList.Add(a);
            psi.Environment["NO_COLOR"] = "1";
            foreach (var (k, v) in environment ?? new Dictionary<string, string>()) psi.Environment[k] = v;
            long t0 = Stopwatch.GetTimestamp();
            using var p = System.Diagnostics.Process.Start(psi)!;
            var stdout = p.StandardOutput.ReadToEndAsync();
            var stderr = p.StandardError.ReadToEndAsync();
            p.WaitForExit();
            long t1 = Stopwatch.GetTimestamp();
            _ = stdout.Result + stderr.Result;
            if (r >= warmup)
            {
                times.Add((t1 - t0) * 1000.0 / Stopwatch.Frequency);
                cpu.Add(ChildrenCpuMs() - cpu0);
            }
        }
        var sorted = times.ToArray();
        Array.Sort(sorted);
        var cpuSorted = cpu.ToArray();
        Array.Sort(cpuSorted);
        return new Timing(Median(sorted), sorted[0], 0, runs, CpuMs: Median(cpuSorted));
    }

    /// <summary>
    /// User + system CPU time of the exited, reaped children of this process (getrusage(RUSAGE_CHILDREN)).
    /// On a busy machine a fresh process waits for a core; its CPU time does not.
    /// </summary>
    public static double ChildrenCpuMs()
    {
        if (!OperatingSystem.IsLinux()) return double.NaN;
        return getrusage(-1, out var u) == 0 ? (u.UserSec + u.SysSec) * 1000.0 + (u.UserUsec + u.SysUsec) / 1000.0 : double.NaN;
    }

    /// <summary>CPU time of the calling thread (CLOCK_THREAD_CPUTIME_ID): immune to waiting for a core on a busy machine.</summary>
    public static double ThreadCpuMs()
    {
        if (!OperatingSystem.IsLinux()) return double.NaN;
        return clock_gettime(3, out var ts) == 0 ? ts.Sec * 1000.0 + ts.Nsec / 1e6 : double.NaN;
    }

    [System.Runtime.InteropServices.StructLayout(System.Runtime.InteropServices.LayoutKind.Sequential)]
    private struct TimeSpec
    {
        public long Sec, Nsec;
    }

    [System.Runtime.InteropServices.DllImport("libc")]
    private static extern int clock_gettime(int clock, out TimeSpec ts);

    [System.Runtime.InteropServices.StructLayout(System.Runtime.InteropServices.LayoutKind.Sequential)]
    private struct RUsage
    {
        public long UserSec, UserUsec, SysSec, SysUsec;
        public long MaxRss, IxRss, IdRss, IsRss, MinFlt, MajFlt, NSwap, InBlock, OuBlock, MsgSnd, MsgRcv, NSignals, NvCsw, NivCsw;
    }

    [System.Runtime.InteropServices.DllImport("libc", SetLastError = true)]
    private static extern int getrusage(int who, out RUsage usage);
}
