using System.CommandLine;
using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Input;
using CutSheet.Cli.Output;
using CutSheet.Cli.Output.Json;
using CutSheet.Cli.Output.Sarif;
using CutSheet.Cli.Rendering;

namespace CutSheet.Cli.Commands;

/// <summary><c>cutsheet check PATH...</c>: evaluate many sheets and report their findings for CI.</summary>
internal static class CheckCommand
{
    /// <summary>Printed after the generated help of <c>check</c>.</summary>
    public const string Details =
        "Prints every diagnostic as PATH:LINE:COLUMN: SEVERITY CODE MESSAGE, where LINE and COLUMN count from 1 and\n" +
        "COLUMN counts UTF-16 code units (as editors and SARIF's utf16CodeUnits do); SEVERITY is error, warning or info.\n" +
        "Then one summary line. The sheets are never modified.\n\n" + ExitCodeHelp.Check;

    public static Command Create(CliHost host)
    {
        var paths = new Argument<string[]>("PATH")
        {
            Description = "Sheet files, or directories searched recursively for *.cutsheet (checked in ordinal path order)",
            Arity = ArgumentArity.OneOrMore,
        };
        var format = ChoiceOption.Create("--format", "Output format (sarif: SARIF 2.1.0 for code scanning)",
            ("text", OutputFormat.Text), ("json", OutputFormat.Json), ("sarif", OutputFormat.Sarif));
        var failOn = ChoiceOption.Create("--fail-on",
            "Lowest finding that fails the check: error (errors, failed and not evaluated checks), " +
            "or caution (also warnings and cautions not accepted in the sheet)",
            ("error", FailOn.Error), ("caution", FailOn.Caution));
        var units = SharedOptions.Units();
        var workspace = SharedOptions.Workspace();

        var command = new Command("check", "Check sheets and report their findings, e.g. in CI")
        {
            paths, format, failOn, units, workspace,
        };

        command.SetAction(parse =>
        {
            var settings = new EvaluationSettings(
                parse.GetValue(units),
                Digits: null,
                Overrides: new Dictionary<string, string>(),
                WorkspaceRootLocator.FromOption(parse.GetValue(workspace), host.WorkingDirectory),
                host.WorkingDirectory);
            var files = SheetPathExpander.Expand(parse.GetValue(paths) ?? [], host.WorkingDirectory);
            // Read everything before evaluating anything: an unreadable file is a usage error, reported before any output.
            var sheets = files.Select(f => SheetFileReader.Read(f, host.WorkingDirectory)).ToList();

            var evaluations = sheets.Select(s => SheetExecutor.Evaluate(s, settings)).ToList();
            var run = CheckRun.From(evaluations, parse.GetValue(failOn), host.WorkingDirectory);
            switch (parse.GetValue(format))
            {
                case OutputFormat.Json:
                    CheckJsonWriter.Write(host.Out, run);
                    break;
                case OutputFormat.Sarif:
                    SarifWriter.Write(host.Out, run);
                    break;
                default:
                    CheckTextRenderer.Write(host.Out, run.Findings, run.Tally, new Painter(ColorPolicy.UseColor(host)));
                    break;
            }
            return run.ExitCode;
        });
        return command;
    }
}
