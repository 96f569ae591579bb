namespace CutSheet.Bench;

/// <summary>
/// CutSheet against pint in pairs: each pint run sits between two short blocks of CutSheet
/// runs, and its ratio is taken against the mean of those two blocks. The shared host has slow
/// spells lasting seconds that slow both programs; a ratio of medians taken minutes apart
/// compares one program's spell with the other's calm, a ratio per pair does not.
/// </summary>
internal static class PintComparison
{
    /// <summary>CutSheet runs timed on each side of a pint run (median of these).</summary>
    private const int BlockRuns = 5;

    public static PintResult? Run(string script, string body, int pairs, Func<double> cutSheet)
    {
        using var session = PintSession.Start(script, body);
        if (session is null) return null;
        session.RunOnce(); // warm-up: the first exec fills pint's caches for these units
        var pintWall = new double[pairs];
        var pintCpu = new double[pairs];
        var cutWall = new double[pairs];
        var cutCpu = new double[pairs];
        var ratio = new double[pairs];
        var ratioCpu = new double[pairs];
        for (int i = 0; i < pairs; i++)
        {
            var before = Measure.Timed(cutSheet, BlockRuns);
            var (wall, cpu) = session.RunOnce();
            var after = Measure.Timed(cutSheet, BlockRuns);
            pintWall[i] = wall;
            pintCpu[i] = cpu;
            cutWall[i] = (before.MedianMs + after.MedianMs) / 2;
            cutCpu[i] = (before.CpuMs + after.CpuMs) / 2;
            ratio[i] = wall / cutWall[i];
            ratioCpu[i] = cpu / cutCpu[i];
            if (Measure.Raw)
                Console.Error.WriteLine($"  pair {i + 1}: CutSheet {before.MedianMs:F2} ms before, {after.MedianMs:F2} ms after; pint {wall:F0} ms; ratio {ratio[i]:F0}×");
        }
        var (x, f) = session.End();
        string runs = string.Join(", ", pintWall.Select(t => t.ToString("F0", System.Globalization.CultureInfo.InvariantCulture))) + " ms";
        string ratios = string.Join(", ", ratio.Select(r => r.ToString("F0", System.Globalization.CultureInfo.InvariantCulture) + "×"));
        // Interpreter start-up on its own: fresh `python3 -c pass` processes.
        var interp = Measure.Process("/usr/bin/python3", ["-c", "pass"], Environment.CurrentDirectory, 5);
        return new PintResult(session.Version, session.Python, MedianOf(pintWall), MedianOf(pintCpu),
            MedianOf(cutWall), MedianOf(cutCpu), MedianOf(ratio), MedianOf(ratioCpu),
            session.ImportMs, interp.MedianMs, session.CompileMs, session.StartMs, x, f, runs, ratios);
    }

    private static double MedianOf(double[] values)
    {
        var sorted = values.ToArray();
        Array.Sort(sorted);
        return Measure.Median(sorted);
    }
}
