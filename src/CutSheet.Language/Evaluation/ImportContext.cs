using CutSheet.Language.Results;
using CutSheet.Language.Semantics;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// State shared by one evaluation and the imports it pulls in: evaluated imports by path and
/// overrides (each evaluated once), and the chain of sheets being loaded, to catch cycles.
/// </summary>
internal sealed class ImportContext
{
    internal Dictionary<string, (SheetScope Scope, SheetResult Result)> Cache { get; } = new(StringComparer.Ordinal);

    internal List<string> Loading { get; } = [];

    internal const int MaxDepth = 16;
}
