using System.Diagnostics;
using System.Globalization;
using System.Runtime.InteropServices;
using System.Text.Json;
using CutSheet.Bench;
using CutSheet.Cli;
using CutSheet.Language;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax;

// CutSheet benchmark harness. One run prints, side by side: CutSheet on a generated sheet, the
// same arithmetic on plain doubles (the floor), the same sheet with pint, and the cold wall time
// of `cutsheet check` from published builds. See docs/performance.md.

var opts = Options.Parse(args);
if (opts.Help)
{
    Console.WriteLine("""
        dotnet run -c Release --project bench/CutSheet.Bench -- [options]
          --publish        publish src/CutSheet.Cli as Native AOT, ReadyToRun and plain JIT first
                           (into bench/out/publish/{aot,r2r,jit}; ~1-2 minutes)
          --lines N        lines of the generated sheet (multiple of 100; default 10000)
          --runs N         timed runs per in-process figure (default 15)
          --warmup N       evaluations of the sheet before any timing (default 150: lets tiered JIT settle)
          --cold-runs N    fresh processes per cold figure (default 10)
          --pint-runs N    pint runs, each timed between two blocks of CutSheet runs (default 9)
          --no-pint  --no-cold  --no-kinds  --no-phases
          --raw            also print every timed run (on standard error)
          --loop S [--loop-kind KIND] [--loop-parsed]   only evaluate the sheet (or a sheet of one kind of line) for S seconds
                   (--loop-parsed: parse it once and time binding and evaluation alone),
                           for a profiler (perf, dotnet-trace); see docs/performance.md
          --once           evaluate bench/out/bench.cutsheet once in this fresh process and print its GC count
          --out DIR        working folder (default bench/out)
        """);
    return 0;
}

string root = FindRepoRoot();
string outDir = Path.GetFullPath(opts.Out ?? Path.Combine(root, "bench", "out"));
Directory.CreateDirectory(outDir);
var inv = CultureInfo.InvariantCulture;
string Ms(double ms) => ms >= 100 ? ms.ToString("F0", inv) : ms >= 10 ? ms.ToString("F1", inv) : ms >= 1 ? ms.ToString("F2", inv) : ms.ToString("F3", inv);
string Us(double us) => us >= 100 ? us.ToString("F0", inv) : us >= 10 ? us.ToString("F1", inv) : us >= 0.1 ? us.ToString("F2", inv) : us.ToString("F4", inv);
string Kb(double bytes) => (bytes / 1024).ToString("F1", inv);

if (opts.Once)
{
    // One evaluation of bench/out/bench.cutsheet in this fresh process, nothing else first: what a cold
    // `cutsheet check` pays in GC (compare DOTNET_GCgen0size=0x4000000 and other GC settings).
    string onceText = File.ReadAllText(Path.Combine(outDir, "bench.cutsheet"));
    long o0 = Stopwatch.GetTimestamp();
    var once = SheetRunner.Run(onceText);
    double onceMs = Stopwatch.GetElapsedTime(o0).TotalMilliseconds;
    Console.WriteLine($"- one cold evaluation: {onceMs:F1} ms, {once.Statements.Count} statements; GC collections: {GC.CollectionCount(0)} " +
        $"(of which gen1 or gen2: {GC.CollectionCount(1)}, gen2: {GC.CollectionCount(2)}), pauses {GC.GetTotalPauseDuration().TotalMilliseconds:F1} ms; " +
        $"allocated {GC.GetTotalAllocatedBytes() / 1048576.0:F1} MiB");
    return 0;
}

// ---------- the machine ----------
string load0 = LoadAverage();
Console.WriteLine($"# CutSheet benchmark — {DateTime.Now:yyyy-MM-dd HH:mm}");
Console.WriteLine();
Console.WriteLine($"- machine: {CpuModel()}, {Environment.ProcessorCount} cores, {RuntimeInformation.OSDescription}, {RuntimeInformation.FrameworkDescription}");
Console.WriteLine($"- load average at start: {load0}{(Load1() >= 1.5 ? "  ** busy machine (>= 1.5): re-run when quieter **" : "")}");

// ---------- the sheet ----------
var lines = SheetGenerator.Generate(opts.Lines);
string text = SheetGenerator.SheetText(lines);
string sheetPath = Path.Combine(outDir, "bench.cutsheet");
string tinyPath = Path.Combine(outDir, "tiny.cutsheet");
string pyBodyPath = Path.Combine(outDir, "bench_pint_body.py");
File.WriteAllText(sheetPath, text);
File.WriteAllText(tinyPath, "use screws\nd = 16 mm\nlam = lead_angle(lead: 5 mm/rev, d: d) as deg\ncheck d <= 10 m\n");
File.WriteAllText(pyBodyPath, SheetGenerator.PythonText(lines));
Console.WriteLine($"- sheet: {opts.Lines:N0} lines ({SheetGenerator.Describe(lines)}), {new FileInfo(sheetPath).Length / 1024} KiB, written to {Path.GetRelativePath(root, sheetPath)}");

var result = SheetRunner.Run(text);
if (result.Diagnostics.Count > 0)
{
    Console.WriteLine($"  the sheet has {result.Diagnostics.Count} diagnostics, first: {result.Diagnostics[0].Code} {result.Diagnostics[0].Message}");
    return 1;
}
int checks = result.Checks.Count(c => c.Status == CheckStatus.Passed);
if (opts.LoopSeconds > 0)
{
    // For a profiler: `dotnet-trace collect -- dotnet CutSheet.Bench.dll --loop 20 [--loop-kind chain]`.
    string loopText = opts.LoopKind is null ? text : SheetGenerator.SingleKind(Enum.Parse<LineKind>(opts.LoopKind, ignoreCase: true), opts.Lines);
    // --loop-parsed: parse once and evaluate that syntax again and again, to profile binding and evaluation alone.
    var parsed = opts.LoopParsed ? SheetSyntax.Parse(loopText) : null;
    var loop = Stopwatch.StartNew();
    int iterations = 0;
    while (loop.Elapsed.TotalSeconds < opts.LoopSeconds)
    {
        // As in the timed runs: a collected heap before each sheet (filter GC.Collect out of the profile).
        GC.Collect();
        GC.WaitForPendingFinalizers();
        GC.Collect();
        Measure.Sink += (parsed is null ? SheetRunner.Run(loopText) : SheetRunner.Run(parsed)).Statements.Count;
        iterations++;
    }
    Console.WriteLine($"- looped {iterations} times: {loop.Elapsed.TotalMilliseconds / iterations:F1} ms per sheet");
    return 0;
}
Console.WriteLine($"- CutSheet evaluates it with no diagnostics: {result.Definitions.Count(d => d.Value is not null):N0} values, {checks} checks passed");

// ---------- side by side ----------
// Tiered JIT promotes a method called once per sheet only after ~30 calls at tier 0 and ~30 more
// instrumented (dynamic PGO), each step behind a background compile: warm up with 150 sheets first.
var warmAll = Stopwatch.StartNew();
for (int i = 0; i < opts.WarmupSheets; i++) Measure.Sink += SheetRunner.Run(text).Statements.Count;
Console.WriteLine($"- warm-up: {opts.WarmupSheets} evaluations of the sheet in {warmAll.Elapsed.TotalSeconds:F1} s, then medians of {opts.Runs} runs");
Console.WriteLine();
var floor = new Floor(opts.Lines);
var tRun = Measure.Run(() => SheetRunner.Run(text).Statements.Count, opts.Runs, warmupSeconds: 1.0);
var tFloor = Measure.Run(() => floor.Run(opts.Lines), opts.Runs, inner: 200);
double cutX = Si(result, $"x{floor.LastX}"), cutF = Si(result, $"F{floor.LastF}");

PintResult? pint = opts.NoPint ? null
    : PintComparison.Run(Path.Combine(root, "bench", "CutSheet.Bench", "pint_chain.py"), pyBodyPath, opts.PintRuns, () => SheetRunner.Run(text).Statements.Count);

var cold = new List<(string Mode, string Binary, Timing Version, Timing Tiny, Timing Bench, long Bytes)>();
var spawn = new Timing();
if (opts.Publish) Publish(root, outDir);
if (!opts.NoCold)
{
    spawn = Measure.Process("/bin/true", [], outDir, opts.ColdRuns);
    // "aot+gen0": the same Native AOT binary with a 64 MiB gen0 budget (hex 4000000), as the proposed
    // <IlcArg Include="--runtimeopt:GCgen0size=4000000" /> would bake in: a sheet this size then needs no GC.
    foreach (var mode in new[] { "aot", "aot+gen0", "r2r", "jit" })
    {
        string bin = Path.Combine(outDir, "publish", mode.Split('+')[0], "cutsheet");
        if (!File.Exists(bin)) continue;
        var env = mode.EndsWith("+gen0", StringComparison.Ordinal) ? new Dictionary<string, string> { ["DOTNET_GCgen0size"] = "4000000" } : null;
        var v = Measure.Process(bin, ["--version"], outDir, opts.ColdRuns, environment: env);
        var t = Measure.Process(bin, ["check", "tiny.cutsheet"], outDir, opts.ColdRuns, environment: env);
        var b = Measure.Process(bin, ["check", "bench.cutsheet"], outDir, opts.ColdRuns, environment: env);
        // What ships: everything but debug symbols (.pdb, .dbg).
        long bytes = Directory.EnumerateFiles(Path.GetDirectoryName(bin)!, "*", SearchOption.AllDirectories)
            .Where(f => !f.EndsWith(".pdb", StringComparison.Ordinal) && !f.EndsWith(".dbg", StringComparison.Ordinal)).Sum(f => new FileInfo(f).Length);
        cold.Add((mode, bin, v, t, b, bytes));
    }
}

int n = opts.Lines;
double runUs = tRun.PerLineUs(n), floorUs = tFloor.PerLineUs(n);
double runCpuUs = tRun.CpuMs * 1000 / n;
double pintMs = pint?.MedianMs ?? double.NaN, pintCpuMs = pint?.CpuMedianMs ?? double.NaN;
Console.WriteLine("## Side by side (one run; warm medians: wall time, and CPU time of the thread in brackets)");
Console.WriteLine();
Console.WriteLine("| what | per sheet | µs per line | ratio | final x, F (SI: m, N) |");
Console.WriteLine("|---|---:|---:|---|---|");
Console.WriteLine($"| CutSheet parse+bind+check+evaluate (`SheetRunner.Run`) | {Ms(tRun.MedianMs)} ms ({Ms(tRun.CpuMs)}) | {Us(runUs)} ({Us(runCpuUs)}) | 1 | {cutX:R}, {cutF:R} |");
Console.WriteLine($"| plain C# doubles (the floor) | {Ms(tFloor.MedianMs)} ms ({Ms(tFloor.CpuMs)}) | {Us(floorUs)} ({Us(tFloor.CpuMs * 1000 / n)}) | CutSheet takes {tRun.MedianMs / tFloor.MedianMs:F0}× ({tRun.CpuMs / tFloor.CpuMs:F0}×) the floor | {floor.X(floor.LastX):R}, {floor.Force(floor.LastF):R} |");
if (pint is not null)
{
    Console.WriteLine($"| pint {pint.Version} (Python {pint.Python}), timed inside Python, one run per pair | {Ms(pintMs)} ms ({Ms(pintCpuMs)}) | {Us(pintMs * 1000 / n)} ({Us(pintCpuMs * 1000 / n)}) | CutSheet is {pint.Ratio:F0}× ({pint.RatioCpu:F0}×) faster (median of the per-pair ratios) | {pint.X:R}, {pint.F:R} |");
    Console.WriteLine($"| CutSheet in the pairs ({opts.PintRuns} pairs; each the mean of 5-run medians just before and just after the pint run) | {Ms(pint.CutSheetMs)} ms ({Ms(pint.CutSheetCpuMs)}) | {Us(pint.CutSheetMs * 1000 / n)} ({Us(pint.CutSheetCpuMs * 1000 / n)}) | — | — |");
}
foreach (var c in cold)
    Console.WriteLine($"| cold `cutsheet check bench.cutsheet`, {ModeName(c.Mode)}, fresh process (CPU: user+sys) | {Ms(c.Bench.MedianMs)} ms ({Ms(c.Bench.CpuMs)}) | — | — | — |");
Console.WriteLine();
if (pint is not null)
    Console.WriteLine($"pint outside the timing: interpreter start-up {pint.InterpreterMs:F0} ms, `import pint` + `UnitRegistry()` {pint.ImportMs:F0} ms, compiling the {n:N0}-line Python body {pint.CompileMs:F0} ms (process start to ready {pint.StartMs / 1000:F1} s); timed runs {pint.RunsText}; per-pair ratios {pint.RatiosText}.");
Console.WriteLine($"CutSheet allocates {Kb(tRun.AllocatedBytes / n)} KiB per line ({tRun.AllocatedBytes / 1048576:F1} MiB per sheet); GC pauses {tRun.GcText} per sheet (gen0/gen1/gen2 collections, after a full collection before each run); fastest run {Ms(tRun.MinMs)} ms.");
Console.WriteLine();

Console.WriteLine("## Targets (wall time; CPU time in brackets — the fairer figure when the load average is above the core count)");
Console.WriteLine();
Console.WriteLine("| target | measured | met? |");
Console.WriteLine("|---|---|---|");
Console.WriteLine($"| ≤ 1 µs per line | {Us(runUs)} µs ({Us(runCpuUs)}) | {Verdict(runUs <= 1, $"{runUs:F1}× over")} ({Verdict(runCpuUs <= 1, $"{runCpuUs:F1}× over")}) |");
double fr = tRun.MedianMs / tFloor.MedianMs, frc = tRun.CpuMs / tFloor.CpuMs;
Console.WriteLine($"| ≤ 20× the floor | {fr:F0}× ({frc:F0}×) | {Verdict(fr <= 20, $"{fr / 20:F0}× over")} ({Verdict(frc <= 20, $"{frc / 20:F0}× over")}) |");
if (pint is not null)
{
    double pr = pint.Ratio, prc = pint.RatioCpu;
    Console.WriteLine($"| ≥ 50× faster than pint | {pr:F0}× ({prc:F0}×) | {Verdict(pr >= 50, $"short by {50 / pr:F1}×")} ({Verdict(prc >= 50, $"short by {50 / prc:F1}×")}) |");
}
foreach (var c in cold)
    Console.WriteLine($"| cold `check` ≤ 150 ms, {ModeName(c.Mode)} | {Ms(c.Bench.MedianMs)} ms ({Ms(c.Bench.CpuMs)}) | {Verdict(c.Bench.MedianMs <= 150, $"{c.Bench.MedianMs - 150:F0} ms over")} ({Verdict(c.Bench.CpuMs <= 150, $"{c.Bench.CpuMs - 150:F0} ms over")}) |");
Console.WriteLine();

// ---------- phases ----------
if (!opts.NoPhases)
{
    var tTok = Measure.Run(() => Tokenizer.Tokenize(text).Length, opts.Runs);
    var tParse = Measure.Run(() => SheetSyntax.Parse(text).Statements.Count, opts.Runs);
    var shown = result.Definitions.Where(d => d.Value is not null).Select(d => d.Value!).ToArray();
    var tDisplay = Measure.Run(() =>
    {
        int len = 0;
        foreach (var v in shown) len += new DisplayedValue(v.Quantity, v.Number, v.Unit, v.Digits).Text.Length;
        return len;
    }, opts.Runs);
    var tImport = Measure.Run(() => SheetRunner.Run("use screws\n").Statements.Count, opts.Runs, warmupSeconds: 0.5);
    int tokenCount = Tokenizer.Tokenize(text).Length;
    int significant = Tokenizer.Tokenize(text).Count(t => !t.IsTrivia && t.Kind != TokenKind.Newline);
    Environment.CurrentDirectory = outDir;
    var tCheck = Measure.Run(() => CliApp.Run(["check", "bench.cutsheet"], TextWriter.Null, TextWriter.Null, _ => null), opts.Runs);
    var tRunCli = Measure.Run(() => CliApp.Run(["run", "bench.cutsheet"], TextWriter.Null, TextWriter.Null, _ => null), opts.Runs);
    Console.WriteLine("## Phases (warm, in process; each row includes the rows above it unless it says otherwise)");
    Console.WriteLine();
    Console.WriteLine("| phase | median ms (CPU) | µs per line | KiB allocated per line | GC pause per run (gen0/1/2 collections) |");
    Console.WriteLine("|---|---:|---:|---:|---|");
    Console.WriteLine($"| tokenize (`Tokenizer.Tokenize`) | {Ms(tTok.MedianMs)} ({Ms(tTok.CpuMs)}) | {Us(tTok.PerLineUs(n))} | {Kb(tTok.AllocatedBytes / n)} | {tTok.GcText} |");
    Console.WriteLine($"| parse, tokenizing included (`SheetSyntax.Parse`) | {Ms(tParse.MedianMs)} ({Ms(tParse.CpuMs)}) | {Us(tParse.PerLineUs(n))} | {Kb(tParse.AllocatedBytes / n)} | {tParse.GcText} |");
    Console.WriteLine($"| parse + bind + check + evaluate (`SheetRunner.Run`) | {Ms(tRun.MedianMs)} ({Ms(tRun.CpuMs)}) | {Us(runUs)} | {Kb(tRun.AllocatedBytes / n)} | {tRun.GcText} |");
    Console.WriteLine($"| → of which bind + check + evaluate (Run − Parse) | {Ms(tRun.MedianMs - tParse.MedianMs)} ({Ms(tRun.CpuMs - tParse.CpuMs)}) | {Us(runUs - tParse.PerLineUs(n))} | {Kb((tRun.AllocatedBytes - tParse.AllocatedBytes) / n)} | |");
    Console.WriteLine($"| → of which parse proper (Parse − Tokenize) | {Ms(tParse.MedianMs - tTok.MedianMs)} ({Ms(tParse.CpuMs - tTok.CpuMs)}) | {Us(tParse.PerLineUs(n) - tTok.PerLineUs(n))} | {Kb((tParse.AllocatedBytes - tTok.AllocatedBytes) / n)} | |");
    Console.WriteLine($"| display text of every value (separate: `DisplayedValue.Text`, {shown.Length:N0} values) | {Ms(tDisplay.MedianMs)} ({Ms(tDisplay.CpuMs)}) | {Us(tDisplay.PerLineUs(n))} | {Kb(tDisplay.AllocatedBytes / n)} | {tDisplay.GcText} |");
    Console.WriteLine($"| a sheet of only `use screws` (library read, parsed, declared, function bodies checked) | {Ms(tImport.MedianMs)} ({Ms(tImport.CpuMs)}) | — | {Kb(tImport.AllocatedBytes)} KiB in all | {tImport.GcText} |");
    Console.WriteLine($"| `cutsheet check` in process (file read + Run + findings + summary) | {Ms(tCheck.MedianMs)} ({Ms(tCheck.CpuMs)}) | {Us(tCheck.PerLineUs(n))} | {Kb(tCheck.AllocatedBytes / n)} | {tCheck.GcText} |");
    Console.WriteLine($"| `cutsheet run` in process (… + the aligned listing of every value) | {Ms(tRunCli.MedianMs)} ({Ms(tRunCli.CpuMs)}) | {Us(tRunCli.PerLineUs(n))} | {Kb(tRunCli.AllocatedBytes / n)} | {tRunCli.GcText} |");
    Console.WriteLine();
    Console.WriteLine($"Tokens: {tokenCount:N0} ({tokenCount / (double)n:F1} per line, {significant / (double)n:F1} of them significant); the `SyntaxToken[]` alone is " +
        $"{tokenCount * 16 / 1048576.0:F1} MiB, on the large-object heap.");
    Console.WriteLine();
}

// ---------- cost per kind of line ----------
if (!opts.NoKinds)
{
    Console.WriteLine($"## Cost per kind of line (`SheetRunner.Run` on {n:N0} lines of one kind, warm median)");
    Console.WriteLine();
    Console.WriteLine("| line | example | µs per line (CPU) | KiB per line | estimated share of the mixed sheet |");
    Console.WriteLine("|---|---|---:|---:|---:|");
    var counts = lines.GroupBy(l => l.Kind).ToDictionary(g => g.Key, g => g.Count());
    var kinds = new[] { LineKind.Comment, LineKind.Input, LineKind.Chain, LineKind.Force, LineKind.Conversion, LineKind.Torque, LineKind.LeadAngle, LineKind.Speed, LineKind.Pressure, LineKind.Check };
    foreach (var kind in kinds)
    {
        string sheet = SheetGenerator.SingleKind(kind, n);
        var r = SheetRunner.Run(sheet);
        if (r.Diagnostics.Count > 0) { Console.WriteLine($"| {kind} | diagnostics: {r.Diagnostics[0].Code} {r.Diagnostics[0].Message} | | | |"); continue; }
        var t = Measure.Run(() => SheetRunner.Run(sheet).Statements.Count, Math.Max(5, opts.Runs / 2), warmupSeconds: 0.5);
        string example = sheet.Split('\n')[4];
        double perLine = t.PerLineUs(n);
        string share = counts.TryGetValue(kind, out int c) ? $"{t.CpuMs * c / (tRun.CpuMs * n) * 100:F0} % ({c:N0} lines)" : "—";
        Console.WriteLine($"| {kind.ToString().ToLowerInvariant()} | `{example}` | {Us(perLine)} ({Us(t.CpuMs * 1000 / n)}) | {Kb(t.AllocatedBytes / n)} | {share} |");
    }
    Console.WriteLine();
}

// ---------- cold start ----------
if (cold.Count > 0)
{
    Console.WriteLine($"## Cold `cutsheet` (fresh process each, median of {opts.ColdRuns} after 1 warm-up run; spawning /bin/true costs {Ms(spawn.MedianMs)} ms)");
    Console.WriteLine();
    Console.WriteLine("Wall time, median (CPU time user+sys of the process, median, in brackets).");
    Console.WriteLine();
    Console.WriteLine("| publish mode | size on disk | `--version` | `check tiny.cutsheet` (4 lines) | `check bench.cutsheet` | fastest `check bench` |");
    Console.WriteLine("|---|---:|---:|---:|---:|---:|");
    string W(Timing t) => $"{Ms(t.MedianMs)} ms ({Ms(t.CpuMs)})";
    foreach (var c in cold)
        Console.WriteLine($"| {ModeName(c.Mode)} | {c.Bytes / 1048576.0:F1} MiB{(c.Mode.StartsWith("aot", StringComparison.Ordinal) ? "" : " + shared runtime")} | {W(c.Version)} | {W(c.Tiny)} | {W(c.Bench)} | {Ms(c.Bench.MinMs)} ms |");
    Console.WriteLine();
}
else if (!opts.NoCold)
{
    Console.WriteLine("No published `cutsheet` in bench/out/publish/{aot,r2r,jit}: run with --publish to build them (needs gcc or clang, and zlib1g-dev for Native AOT).");
    Console.WriteLine();
}

Console.WriteLine($"- load average at end: {LoadAverage()}");
return 0;

// ---------- helpers ----------
static string Verdict(bool met, string miss) => met ? "met" : $"**missed** ({miss})";

static string ModeName(string mode) => mode switch
{
    "aot" => "Native AOT",
    "aot+gen0" => "Native AOT, gen0 budget 64 MiB",
    "r2r" => "ReadyToRun",
    _ => "JIT (framework-dependent)",
};

static double Si(SheetResult r, string name) =>
    r.Definitions.FirstOrDefault(d => d.Name == name)?.Value?.Quantity.Si ?? double.NaN;

static string FindRepoRoot()
{
    foreach (var start in new[] { Environment.CurrentDirectory, AppContext.BaseDirectory })
    {
        for (var dir = new DirectoryInfo(start); dir is not null; dir = dir.Parent)
            if (File.Exists(Path.Combine(dir.FullName, "CutSheet.sln"))) return dir.FullName;
    }
    throw new InvalidOperationException("run from inside the CutSheet repository");
}

static string LoadAverage()
{
    try { return string.Join(' ', File.ReadAllText("/proc/loadavg").Split(' ').Take(3)); } catch { return "?"; }
}

static double Load1() => double.TryParse(LoadAverage().Split(' ')[0], CultureInfo.InvariantCulture, out var l) ? l : 0;

static string CpuModel()
{
    try { return File.ReadLines("/proc/cpuinfo").First(l => l.StartsWith("model name")).Split(':', 2)[1].Trim(); } catch { return "?"; }
}

static void Publish(string root, string outDir)
{
    var modes = new (string Mode, string[] Args)[]
    {
        ("aot", ["-r", "linux-x64", "-p:PublishAot=true"]),
        // The project publishes Native AOT by default; the other two modes switch it off.
        ("r2r", ["-r", "linux-x64", "--self-contained", "false", "-p:PublishAot=false", "-p:PublishReadyToRun=true"]),
        ("jit", ["-r", "linux-x64", "--self-contained", "false", "-p:PublishAot=false"]),
    };
    foreach (var (mode, extra) in modes)
    {
        string dir = Path.Combine(outDir, "publish", mode);
        if (Directory.Exists(dir)) Directory.Delete(dir, recursive: true);
        var psi = new ProcessStartInfo("dotnet") { WorkingDirectory = root, UseShellExecute = false, RedirectStandardOutput = true, RedirectStandardError = true };
        foreach (var a in new[] { "publish", "src/CutSheet.Cli", "-c", "Release", "-o", dir, "-nologo", "-v", "q" }.Concat(extra)) psi.ArgumentList.Add(a);
        Console.WriteLine($"- publishing ({ModeName(mode)}): dotnet {string.Join(' ', psi.ArgumentList)}");
        var sw = Stopwatch.StartNew();
        using var p = Process.Start(psi)!;
        var o = p.StandardOutput.ReadToEndAsync();
        var e = p.StandardError.ReadToEndAsync();
        p.WaitForExit();
        Console.WriteLine($"  {(p.ExitCode == 0 ? "done" : "FAILED")} in {sw.Elapsed.TotalSeconds:F0} s");
        if (p.ExitCode != 0) Console.WriteLine(o.Result + e.Result);
    }
    Console.WriteLine();
}

internal sealed class Options
{
    public bool Help, Publish, Once, NoPint, NoCold, NoKinds, NoPhases, LoopParsed;
    public int Lines = 10_000, Runs = 15, ColdRuns = 10, PintRuns = 9, WarmupSheets = 150;
    public string? Out, LoopKind;
    public double LoopSeconds;

    public static Options Parse(string[] args)
    {
        var o = new Options();
        for (int i = 0; i < args.Length; i++)
        {
            int Next() => int.Parse(args[++i], CultureInfo.InvariantCulture);
            switch (args[i])
            {
                case "-h" or "--help": o.Help = true; break;
                case "--publish": o.Publish = true; break;
                case "--once": o.Once = true; break;
                case "--raw": Measure.Raw = true; break;
                case "--no-pint": o.NoPint = true; break;
                case "--no-cold": o.NoCold = true; break;
                case "--no-kinds": o.NoKinds = true; break;
                case "--no-phases": o.NoPhases = true; break;
                case "--lines": o.Lines = Next(); break;
                case "--runs": o.Runs = Next(); break;
                case "--warmup": o.WarmupSheets = Next(); break;
                case "--cold-runs": o.ColdRuns = Next(); break;
                case "--pint-runs": o.PintRuns = Next(); break;
                case "--out": o.Out = args[++i]; break;
                case "--loop": o.LoopSeconds = double.Parse(args[++i], CultureInfo.InvariantCulture); break;
                case "--loop-kind": o.LoopKind = args[++i]; break;
                case "--loop-parsed": o.LoopParsed = true; break;
                default: throw new ArgumentException($"unknown option {args[i]} (see --help)");
            }
        }
        return o;
    }
}
