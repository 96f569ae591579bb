using CutSheet.Language.Diagnostics;

namespace CutSheet.Cli.Output;

/// <summary>A diagnostic placed in a file: the CLI's form of <see cref="Diagnostic"/>, ready for every output format.</summary>
/// <param name="FullPath">The file the finding is in (an imported sheet's path when the diagnostic came from there).</param>
/// <param name="DisplayPath">That file's path as shown to the user.</param>
internal sealed record Finding(
    string Code,
    Severity Severity,
    string FullPath,
    string DisplayPath,
    SourceRange Range,
    string Message,
    IReadOnlyList<FixInfo> Fixes,
    IReadOnlyList<RelatedInfo> Related);
