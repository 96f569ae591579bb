using System.Globalization;
using CutSheet.Cli.Output;
using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Rendering;

/// <summary>
/// Writes a finding as <c>path:line:col: severity CODE message</c>, the form compilers use and editors and
/// CI logs link. Line and column count from 1; the column counts UTF-16 code units.
/// </summary>
internal static class FindingLineFormatter
{
    public static string Format(Finding finding, Painter painter)
    {
        string severity = SeverityNames.Word(finding.Severity);
        var tone = finding.Severity switch
        {
            Severity.Error => Tone.Bad,
            Severity.Warning => Tone.Attention,
            _ => Tone.Notice,
        };
        return string.Create(CultureInfo.InvariantCulture,
            $"{finding.DisplayPath}:{finding.Range.StartLine}:{finding.Range.StartColumn}: {painter.Paint(severity, tone)} {finding.Code} {CliApp.OneLine(finding.Message)}");
    }
}
