using System.CommandLine;
using System.Globalization;
using CutSheet.Language.Display;

namespace CutSheet.Cli.Commands;

/// <summary>Options that more than one command takes, built fresh for each command.</summary>
internal static class SharedOptions
{
    /// <summary>The largest number of significant figures a double can carry meaningfully.</summary>
    public const int MaxDigits = 17;

    public static Option<UnitSystem?> Units() =>
        ChoiceOption.Create<UnitSystem?>(
            "--units",
            "Unit system for computed values, overriding the sheet's 'display units' (both: metric with inch in parentheses)",
            ("metric", UnitSystem.Metric), ("inch", UnitSystem.Inch), ("both", UnitSystem.Both));

    public static Option<string?> Workspace() => new("--workspace")
    {
        Description = "Root directory that 'use \"path\"' imports may not leave [default: nearest ancestor with .git, else the sheet's directory]",
        HelpName = "DIR",
    };

    public static Option<int?> Digits() => new("--digits")
    {
        Description = $"Significant figures shown (1-{MaxDigits}), overriding the sheet's 'display digits'",
        HelpName = "N",
        CustomParser = result =>
        {
            if (result.Tokens.Count == 0) return null;
            string given = result.Tokens[^1].Value;
            if (int.TryParse(given, NumberStyles.None, CultureInfo.InvariantCulture, out int n) && n is >= 1 and <= MaxDigits) return n;
            result.AddError($"--digits expects a whole number from 1 to {MaxDigits}, not '{given}'");
            return null;
        },
    };
}
