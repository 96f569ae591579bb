using System.Collections.Concurrent;
using CutSheet.Language.Display;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;

namespace CutSheet.Language.Evaluation;

/// <summary>
/// Library sheets evaluated once per process for each display setting. A library sheet ships with
/// the tool, imports only other library sheets and, without <c>with</c> overrides, evaluates the
/// same way every time; its scope is only read once evaluated (importers copy references to its
/// symbols, calls evaluate in the caller's frame), so every run and thread can share it. A language
/// server re-evaluating a sheet on each keystroke then no longer declares and checks the library
/// again each time. Imports with overrides are evaluated per run, as before.
/// </summary>
internal static class LibraryScopes
{
    private static readonly IReadOnlyDictionary<string, Value> NoOverrides = new Dictionary<string, Value>();

    private static readonly ConcurrentDictionary<(string Name, UnitSystem? Units, int? Digits), Lazy<(SheetScope Scope, SheetResult Result)>> Loaded = new();

    /// <summary>The evaluated library sheet <paramref name="name"/> (parsed as <paramref name="syntax"/>) under the run's display settings.</summary>
    public static (SheetScope Scope, SheetResult Result) Get(string name, SheetSyntax syntax, RunOptions options) =>
        Loaded.GetOrAdd((name, options.Units, options.Digits), key => new Lazy<(SheetScope, SheetResult)>(
            () => SheetEvaluator.EvaluateScope(syntax, RunOptions.Default with { Units = key.Units, Digits = key.Digits }, new ImportContext(), NoOverrides, key.Name),
            // Publication only: should an evaluation ever throw, the next run tries again instead of
            // meeting a cached exception; threads that race all get the one value published first.
            LazyThreadSafetyMode.PublicationOnly)).Value;
}
