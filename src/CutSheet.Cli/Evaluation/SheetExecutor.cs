using CutSheet.Cli.Input;
using CutSheet.Cli.Output;
using CutSheet.Language;
using CutSheet.Language.Evaluation;

namespace CutSheet.Cli.Evaluation;

/// <summary>Hands a sheet to the language with the command line's settings and places the findings.</summary>
internal static class SheetExecutor
{
    public static SheetEvaluation Evaluate(SheetFile file, EvaluationSettings settings)
    {
        string workspace = WorkspaceRootLocator.Locate(file.FullPath, settings.ExplicitWorkspace);
        var options = new RunOptions
        {
            Units = settings.Units,
            Digits = settings.Digits,
            Overrides = settings.Overrides,
            WorkspaceRoot = workspace,
        };
        var result = SheetRunner.Run(file.Text, file.FullPath, options);
        var locations = new LocationResolver(result.Syntax.Source, file.FullPath, settings.WorkingDirectory, options.Sources);
        var findings = FindingFactory.From(result, locations);
        return new SheetEvaluation(file, result, workspace, findings, settings.Overrides, locations);
    }
}
