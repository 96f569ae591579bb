using System.Globalization;

namespace CutSheet.Cli.Output;

/// <summary>
/// A range in a file as people and CI tools count it: lines and columns from 1, columns in UTF-16
/// code units (what editors and SARIF's <c>utf16CodeUnits</c> mean), the end exclusive.
/// </summary>
internal readonly record struct SourceRange(int StartLine, int StartColumn, int EndLine, int EndColumn)
{
    /// <summary>For a location that cannot be resolved (a file that can no longer be read): its first character.</summary>
    public static readonly SourceRange FileStart = new(1, 1, 1, 1);

    public override string ToString() => string.Create(CultureInfo.InvariantCulture, $"{StartLine}:{StartColumn}");
}
