using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Text;

namespace CutSheet.Language;

/// <summary>
/// The language's front door: parse, bind, check and evaluate a sheet, returning an immutable
/// <see cref="SheetResult"/>. Never throws on any sheet text.
/// </summary>
public static class SheetRunner
{
    /// <summary>Evaluates sheet text; <paramref name="path"/> (full path) anchors relative imports.</summary>
    public static SheetResult Run(string text, string? path = null, RunOptions? options = null) =>
        Run(new SourceText(text, path), options);

    public static SheetResult Run(SourceText source, RunOptions? options = null) =>
        SheetEvaluator.Evaluate(source, options ?? RunOptions.Default, new ImportContext());

    /// <summary>Evaluates a sheet already parsed (e.g. with <see cref="Syntax.SheetSyntax.Parse(SourceText, Syntax.SheetSyntax?)"/>, reusing an earlier parse).</summary>
    public static SheetResult Run(Syntax.SheetSyntax syntax, RunOptions? options = null) =>
        SheetEvaluator.Evaluate(syntax, options ?? RunOptions.Default, new ImportContext());
}
