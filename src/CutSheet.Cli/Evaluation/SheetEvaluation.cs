using CutSheet.Cli.Input;
using CutSheet.Cli.Output;
using CutSheet.Language.Results;

namespace CutSheet.Cli.Evaluation;

/// <summary>One sheet after evaluation: the file, the language's result, the workspace used and the placed findings.</summary>
internal sealed record SheetEvaluation(
    SheetFile File,
    SheetResult Result,
    string WorkspaceRoot,
    IReadOnlyList<Finding> Findings,
    IReadOnlyDictionary<string, string> Overrides,
    LocationResolver Locations);
