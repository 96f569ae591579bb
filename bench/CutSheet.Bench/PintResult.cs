namespace CutSheet.Bench;

/// <summary>
/// pint against CutSheet, measured in pairs (see <see cref="PintComparison"/>): medians of the pint
/// runs, of the CutSheet figures around them, and of the per-pair ratios.
/// </summary>
internal sealed record PintResult(string Version, string Python, double MedianMs, double CpuMedianMs,
    double CutSheetMs, double CutSheetCpuMs, double Ratio, double RatioCpu,
    double ImportMs, double InterpreterMs, double CompileMs, double StartMs,
    double X, double F, string RunsText, string RatiosText);
