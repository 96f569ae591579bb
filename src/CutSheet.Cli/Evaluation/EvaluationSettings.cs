using CutSheet.Language.Display;

namespace CutSheet.Cli.Evaluation;

/// <summary>What the command line asks of every evaluation: display overrides, input overrides, the workspace.</summary>
internal sealed record EvaluationSettings(
    UnitSystem? Units,
    int? Digits,
    IReadOnlyDictionary<string, string> Overrides,
    string? ExplicitWorkspace,
    string WorkingDirectory);
