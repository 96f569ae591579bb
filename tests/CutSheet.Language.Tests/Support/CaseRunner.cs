using System.Globalization;
using CutSheet.Language.Results;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// Runs one evaluation case. Expected forms: <c>NUMBER UNIT</c> (the result shown in that unit,
/// equal within half a unit of the last digit written), <c>CUTnnnn</c> (a diagnostic with that
/// code), both together, <c>true</c>/<c>false</c>, or <c>ok</c> (no errors).
/// </summary>
public static class CaseRunner
{
    public static void Run(string where, string input, string expected, string source)
    {
        var result = SheetRunner.Run(SheetText(input));
        var tokens = expected.Split(' ', StringSplitOptions.RemoveEmptyEntries).ToList();
        var codes = tokens.Where(t => t.StartsWith("CUT", StringComparison.Ordinal)).ToList();
        tokens.RemoveAll(t => t.StartsWith("CUT", StringComparison.Ordinal));
        string diagnostics = string.Join("; ", result.Diagnostics.Select(d => $"{d.Code} {d.Message}"));
        foreach (var code in codes)
        {
            Assert.True(result.Diagnostics.Any(d => d.Code == code), $"{where}: expected {code}, got [{diagnostics}] ({source})");
        }
        if (tokens.Count == 0) return;
        var def = result.Definitions.Last();
        if (tokens[0] == "ok")
        {
            Assert.False(result.HasErrors, $"{where}: expected no errors, got [{diagnostics}]");
            return;
        }
        if (codes.Count == 0) Assert.False(result.HasErrors, $"{where}: expected no errors, got [{diagnostics}] ({source})");
        Assert.True(def.Value is not null, $"{where}: value unknown [{diagnostics}]");
        if (tokens[0] is "true" or "false")
        {
            Assert.Equal(tokens[0], def.Value!.NumberText);
            return;
        }
        double number = double.Parse(tokens[0].Replace("−", "-"), NumberStyles.Float, CultureInfo.InvariantCulture);
        string unit = string.Join(" ", tokens.Skip(1));
        Assert.True(unit == def.Value!.Unit, $"{where}: expected unit '{unit}', got '{def.Value.Unit}' ({def.Value.Text}) ({source})");
        double tolerance = HalfLastDigit(tokens[0]) + 1e-12 * Math.Abs(number);
        Assert.True(Math.Abs(def.Value.Number - number) <= tolerance,
            $"{where}: expected {number} {unit} (±{tolerance}), got {def.Value.Number.ToString("R", CultureInfo.InvariantCulture)} {def.Value.Unit} ({source})");
    }

    /// <summary>The sheet a case stands for: statements separated by "; ", the last one defining <c>result</c>.</summary>
    public static string SheetText(string input)
    {
        var parts = input.Split("; ");
        var lines = parts[..^1].Append("result = " + parts[^1]);
        return string.Join("\n", lines) + "\n";
    }

    /// <summary>Half a unit in the last digit written: "104.72" gives 0.005, "1080" gives 0.5, "1.5e3" gives 50.</summary>
    public static double HalfLastDigit(string written)
    {
        string s = written.TrimStart('-', '+', '−');
        int exponent = 0;
        int e = s.IndexOfAny(['e', 'E']);
        if (e >= 0)
        {
            exponent = int.Parse(s[(e + 1)..], CultureInfo.InvariantCulture);
            s = s[..e];
        }
        int dot = s.IndexOf('.');
        int decimals = dot < 0 ? 0 : s.Length - dot - 1;
        return 0.5 * Math.Pow(10, exponent - decimals);
    }
}
