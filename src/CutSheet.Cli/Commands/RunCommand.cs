using System.CommandLine;
using CutSheet.Cli.Evaluation;
using CutSheet.Cli.Input;
using CutSheet.Cli.Output.Json;
using CutSheet.Cli.Rendering;

namespace CutSheet.Cli.Commands;

/// <summary><c>cutsheet run FILE</c>: evaluate one sheet and print its results.</summary>
internal static class RunCommand
{
    /// <summary>Printed after the generated help of <c>run</c>.</summary>
    public const string Details =
        "Lists each value with its line, name, unit and description; each check with its status (passed, FAILED,\n" +
        "NOT EVALUATED), utilisation and margin; each caution raised (NOTICE, CAUTION, WARNING; accepted ones with\n" +
        "their reason); then the diagnostics as PATH:LINE:COLUMN: SEVERITY CODE MESSAGE, where LINE and COLUMN count\n" +
        "from 1 and COLUMN counts UTF-16 code units. The sheet is never modified.\n\n" + ExitCodeHelp.Run;

    public static Command Create(CliHost host)
    {
        var file = new Argument<string>("FILE") { Description = "The sheet to evaluate (a .cutsheet file, read as UTF-8)" };
        var format = ChoiceOption.Create("--format", "Output format",
            ("text", OutputFormat.Text), ("json", OutputFormat.Json));
        var set = new Option<string[]>("--set")
        {
            Description = "Replace an input of the sheet for this run, e.g. --set \"d_0=20 mm\" (repeatable)",
            HelpName = "NAME=VALUE",
            DefaultValueFactory = _ => [],
        };
        var units = SharedOptions.Units();
        var digits = SharedOptions.Digits();
        var workspace = SharedOptions.Workspace();

        var command = new Command("run", "Evaluate one sheet and list its results")
        {
            file, format, set, units, digits, workspace,
        };

        command.SetAction(parse =>
        {
            var settings = new EvaluationSettings(
                parse.GetValue(units),
                parse.GetValue(digits),
                OverrideParser.Parse(parse.GetValue(set)),
                WorkspaceRootLocator.FromOption(parse.GetValue(workspace), host.WorkingDirectory),
                host.WorkingDirectory);
            string path = parse.GetValue(file) ?? "";
            if (path.Trim().Length == 0) throw new CliUsageException("FILE: empty path");
            var sheet = SheetFileReader.Read(Path.GetFullPath(path, host.WorkingDirectory), host.WorkingDirectory);

            var evaluation = SheetExecutor.Evaluate(sheet, settings);
            var tally = SheetTally.Of(evaluation);
            int exitCode = FailurePolicy.ForRun(tally);
            if (parse.GetValue(format) == OutputFormat.Json) RunJsonWriter.Write(host.Out, evaluation, tally, exitCode);
            else RunTextRenderer.Write(host.Out, evaluation, tally, new Painter(ColorPolicy.UseColor(host)));
            return exitCode;
        });
        return command;
    }
}
