using System.Globalization;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Cli.Rendering;

/// <summary>The words and number formats of the text output; all numbers use the invariant culture.</summary>
internal static class Words
{
    public static string Count(int n, string singular, string plural) =>
        n.ToString(CultureInfo.InvariantCulture) + " " + (n == 1 ? singular : plural);

    public static string Count(int n, string word) => n.ToString(CultureInfo.InvariantCulture) + " " + word;

    public static string Line(int zeroBased) => (zeroBased + 1).ToString(CultureInfo.InvariantCulture);

    /// <summary>A fraction as a percentage with one decimal: 0.525 → "52.5 %".</summary>
    public static string Percent(double fraction) =>
        double.IsFinite(fraction) ? (fraction * 100).ToString("0.0", CultureInfo.InvariantCulture) + " %" : "n/a";

    public static string Status(CheckStatus status) => status switch
    {
        CheckStatus.Passed => "passed",
        CheckStatus.Failed => "FAILED",
        _ => "NOT EVALUATED",
    };

    public static Tone StatusTone(CheckStatus status) => status switch
    {
        CheckStatus.Passed => Tone.Good,
        CheckStatus.Failed => Tone.Bad,
        _ => Tone.Attention,
    };

    public static string Level(CautionLevel level) => level switch
    {
        CautionLevel.Notice => "NOTICE",
        CautionLevel.Caution => "CAUTION",
        _ => "WARNING",
    };

    public static Tone LevelTone(CautionLevel level) => level switch
    {
        CautionLevel.Notice => Tone.Notice,
        CautionLevel.Caution => Tone.Attention,
        _ => Tone.Bad,
    };
}
