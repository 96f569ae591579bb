namespace CutSheet.Cli.Rendering;

/// <summary>The line printed under results whenever a caution fired or a check did not pass.</summary>
internal static class SafetyNotice
{
    public const string Text =
        "These figures are engineering estimates. Confirm them against the machine builder's data, " +
        "the applicable local codes and licensed engineering practice before anyone relies on them.";
}
