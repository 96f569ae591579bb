using System.Globalization;
using System.Text;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Display;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;

namespace CutSheet.Language.Tests.Docs;

/// <summary>
/// The worked examples of the documentation, checked. In a Markdown file under docs/, every
/// fenced block tagged <c>cutsheet</c> is a sheet; the <c>text</c> block that follows it is what
/// the sheet evaluates to, rendered by <see cref="Render"/>. A <c>cutsheet</c> block whose first
/// line is <c>// file: PATH</c> is not evaluated: it is written to PATH in the document's
/// scratch workspace, for the examples after it to import. With <c>CUTSHEET_BLESS=1</c> the
/// <c>text</c> blocks are rewritten from the evaluation (read the diff before committing).
/// </summary>
public static class DocExamples
{
    public const string BlessVariable = "CUTSHEET_BLESS";

    public static bool Blessing => Environment.GetEnvironmentVariable(BlessVariable) == "1";

    public sealed record Mismatch(int Line, string Sheet, string Expected, string Actual);

    /// <summary>The outcome for one document: examples whose output differs, and rows of the code table whose example fails.</summary>
    public sealed record Outcome(IReadOnlyList<Mismatch> Mismatches, IReadOnlyList<Mismatch> CodeRows);

    /// <summary>
    /// Evaluates every example of a document; returns the examples whose output differs (rewriting
    /// them when blessing). Also runs the example of every row of a diagnostic-code table
    /// (<c>| CUTnnnn | severity | meaning | example |</c>, the example's code spans joined as lines):
    /// it must raise that code at the severity named first. Those rows are never rewritten.
    /// </summary>
    public static Outcome Check(string markdownPath)
    {
        string original = File.ReadAllText(markdownPath).Replace("\r\n", "\n");
        var lines = original.Split('\n').ToList();
        var mismatches = new List<Mismatch>();
        var codeRows = new List<Mismatch>();
        string workspace = Path.Combine(Path.GetTempPath(), "cutsheet-docs-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(workspace);
        try
        {
            int i = 0;
            while (i < lines.Count)
            {
                if (lines[i].StartsWith("| CUT", StringComparison.Ordinal))
                {
                    if (CheckCodeRow(lines[i], workspace) is { } failure) codeRows.Add(failure with { Line = i + 1 });
                    i++;
                    continue;
                }
                if (lines[i].Trim() == "```text")
                {
                    // Every result block belongs to the sheet just before it; one that does not is stale.
                    mismatches.Add(new Mismatch(i + 1, "", "(no result block here: it follows no sheet)", lines[i]));
                    i++;
                    continue;
                }
                if (lines[i].Trim() != "```cutsheet") { i++; continue; }
                int sheetStart = i + 1;
                int sheetEnd = FenceEnd(lines, sheetStart);
                var sheetLines = lines.GetRange(sheetStart, sheetEnd - sheetStart);
                string sheet = string.Join("\n", sheetLines) + "\n";
                i = sheetEnd + 1;

                if (sheetLines.Count > 0 && sheetLines[0].StartsWith("// file: ", StringComparison.Ordinal))
                {
                    string relative = sheetLines[0]["// file: ".Length..].Trim();
                    string target = Path.Combine(workspace, relative);
                    Directory.CreateDirectory(Path.GetDirectoryName(target)!);
                    File.WriteAllText(target, sheet);
                    continue;
                }

                string path = Path.Combine(workspace, "sheet.cutsheet");
                var result = SheetRunner.Run(sheet, path, new RunOptions { WorkspaceRoot = workspace });
                string actual = Render(result, workspace);

                int next = i;
                while (next < lines.Count && lines[next].Trim().Length == 0) next++;
                bool hasOutput = next < lines.Count && lines[next].Trim() == "```text";
                string expected = "";
                int outputStart = next + 1, outputEnd = outputStart;
                if (hasOutput)
                {
                    outputEnd = FenceEnd(lines, outputStart);
                    expected = string.Join("\n", lines.GetRange(outputStart, outputEnd - outputStart));
                }
                if (expected == actual)
                {
                    i = hasOutput ? outputEnd + 1 : i;
                    continue;
                }
                mismatches.Add(new Mismatch(sheetStart, sheet, expected, actual));
                var replacement = actual.Length == 0 ? new List<string>() : actual.Split('\n').ToList();
                if (hasOutput)
                {
                    lines.RemoveRange(outputStart, outputEnd - outputStart);
                    lines.InsertRange(outputStart, replacement);
                    i = outputStart + replacement.Count + 1;
                }
                else
                {
                    var block = new List<string> { "", "```text" };
                    block.AddRange(replacement);
                    block.Add("```");
                    lines.InsertRange(i, block);
                    i += block.Count;
                }
            }
        }
        finally
        {
            try { Directory.Delete(workspace, recursive: true); } catch (IOException) { }
        }
        if (Blessing && mismatches.Count > 0) File.WriteAllText(markdownPath, string.Join("\n", lines));
        return new Outcome(mismatches, codeRows);
    }

    /// <summary>Runs the example of one row of a diagnostic-code table; null when it raises the row's code at the row's severity.</summary>
    private static Mismatch? CheckCodeRow(string row, string workspace)
    {
        var cells = System.Text.RegularExpressions.Regex.Split(row.Trim().Trim('|'), @"(?<!\\)\|").Select(c => c.Trim()).ToArray();
        if (cells.Length < 4) return null;
        string code = cells[0];
        string severity = cells[1].Split(' ', 2)[0];
        var spans = System.Text.RegularExpressions.Regex.Matches(cells[^1], "`([^`]*)`").Select(m => m.Groups[1].Value.Replace("\\|", "|")).ToList();
        if (spans.Count == 0) return null;
        string sheet = string.Join("\n", spans) + "\n";
        string path = Path.Combine(workspace, "sheet.cutsheet");
        File.WriteAllText(path, sheet);
        try
        {
            var result = SheetRunner.Run(sheet, path, new RunOptions { WorkspaceRoot = workspace });
            if (result.Diagnostics.Any(d => d.Code == code && SeverityWord(d.Severity) == severity)) return null;
            return new Mismatch(0, sheet, $"{code} {severity}", Render(result, workspace));
        }
        finally
        {
            File.Delete(path);
        }
    }

    private static int FenceEnd(List<string> lines, int start)
    {
        int k = start;
        while (k < lines.Count && lines[k].Trim() != "```") k++;
        if (k >= lines.Count) throw new FormatException($"fenced block opened before line {start} is not closed");
        return k;
    }

    /// <summary>
    /// What a reader of the sheet sees, one line per item in line order: each definition as
    /// <c>name = value</c> with its kind (and <c>input</c> for inputs), each check with its outcome,
    /// utilisation and margin, and each diagnostic as <c>line N: CODE severity: message</c> with the
    /// title of its fix.
    /// </summary>
    public static string Render(SheetResult result, string workspace)
    {
        var source = result.Syntax.Source;
        var items = new List<(int Line, int Order, string Text)>();
        var definitions = new List<(int Line, string Left, string Right)>();
        foreach (var s in result.Statements)
        {
            switch (s)
            {
                case DefinitionResult d:
                    string right = d.Value is null ? "" : d.Kind + (d.IsInput ? ", input" : "") + (d.IsOverridden ? ", overridden" : "");
                    definitions.Add((s.Line, $"{d.Name} = {d.Value?.Text ?? "unknown"}", right));
                    break;
                case CheckResult c:
                    items.Add((s.Line, 0, CheckLine(c)));
                    break;
            }
        }
        int width = definitions.Count == 0 ? 0 : definitions.Max(d => d.Left.Length) + 3;
        foreach (var (line, left, right) in definitions)
            items.Add((line, 0, right.Length == 0 ? left : left.PadRight(width) + right));

        int order = 1;
        foreach (var d in result.Diagnostics)
        {
            int line = source.GetPosition(d.Span.Start).Line;
            var sb = new StringBuilder();
            sb.Append("line ").Append(line + 1).Append(": ").Append(d.Code).Append(' ').Append(SeverityWord(d.Severity)).Append(": ").Append(d.Message);
            if (d.Fixes.Count > 0) sb.Append(" [fix: ").Append(d.Fixes[0].Title).Append(']');
            foreach (var related in d.Related)
            {
                string where = related.Path is null
                    ? "line " + (source.GetPosition(related.Span.Start).Line + 1)
                    : Relative(related.Path, workspace);
                sb.Append("\n    see ").Append(where).Append(": ").Append(related.Message);
            }
            items.Add((line, order++, sb.ToString()));
        }
        return string.Join("\n", items.OrderBy(x => x.Line).ThenBy(x => x.Order).Select(x => x.Text));
    }

    private static string CheckLine(CheckResult c)
    {
        string status = c.Status switch
        {
            CheckStatus.Passed => "check passed",
            CheckStatus.Failed => "check FAILED",
            _ => "check not evaluated",
        };
        if (c.Status == CheckStatus.NotEvaluated) return status;
        var parts = new List<string>();
        if (c.Utilisation is double u) parts.Add("utilisation " + NumberFormatter.Format(u * 100, 3) + " %");
        if (c.Margin is not null) parts.Add("margin " + c.Margin.Primary);
        return $"{status}: {c.Text}" + (parts.Count == 0 ? "" : $" ({string.Join(", ", parts)})");
    }

    private static string SeverityWord(Severity s) => s switch
    {
        Severity.Error => "error",
        Severity.Warning => "warning",
        _ => "info",
    };

    private static string Relative(string path, string workspace)
    {
        if (!Path.IsPathRooted(path)) return path;
        string relative = Path.GetRelativePath(workspace, path);
        return relative.Replace('\\', '/');
    }

    /// <summary>A readable failure message for the mismatches of one document.</summary>
    public static string Describe(string document, IReadOnlyList<Mismatch> mismatches, bool codeRows = false)
    {
        var sb = new StringBuilder();
        if (codeRows)
        {
            sb.Append(CultureInfo.InvariantCulture, $"{mismatches.Count} row(s) of the diagnostic-code table of {document} do not raise their code:\n");
            foreach (var m in mismatches) sb.Append(CultureInfo.InvariantCulture, $"\n--- row at line {m.Line}, expected {m.Expected}:\n{m.Sheet}--- got:\n{m.Actual}\n");
            return sb.ToString();
        }
        sb.Append(CultureInfo.InvariantCulture, $"{mismatches.Count} example(s) of {document} do not evaluate as documented; ")
          .Append($"rerun with {BlessVariable}=1 to rewrite them, then read the diff.\n");
        foreach (var m in mismatches.Take(5))
        {
            sb.Append(CultureInfo.InvariantCulture, $"\n--- example at line {m.Line}:\n{m.Sheet}--- documented:\n{m.Expected}\n--- actual:\n{m.Actual}\n");
        }
        return sb.ToString();
    }
}
