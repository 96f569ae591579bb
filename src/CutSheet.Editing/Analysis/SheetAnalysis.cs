using CutSheet.Editing.Symbols;
using CutSheet.Language;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Analysis;

/// <summary>
/// One evaluated version of one sheet: the text, the language's result and, built on first
/// use, the index of every name occurrence. Immutable, so any number of requests may read it
/// while a newer version is being evaluated.
/// </summary>
public sealed class SheetAnalysis
{
    private readonly Lazy<SymbolIndex> _index;

    public SheetAnalysis(SheetResult result, int version)
    {
        Result = result;
        Version = version;
        _index = new Lazy<SymbolIndex>(() => SymbolIndex.Build(this), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>Evaluates <paramref name="text"/>; <paramref name="path"/> (full path or null) anchors imports.</summary>
    public static SheetAnalysis Evaluate(string text, string? path, int version, RunOptions? options = null) =>
        new(SheetRunner.Run(text, path, options), version);

    /// <summary>
    /// Evaluates a text whose line map is already built (an open document's), so it is not built
    /// again; the statements that an edit left unchanged since <paramref name="previous"/> (an
    /// earlier analysis of the same document) are not parsed again either.
    /// </summary>
    public static SheetAnalysis Evaluate(SourceText source, int version, RunOptions? options = null, SheetAnalysis? previous = null)
    {
        var earlier = previous is not null && previous.Path == source.Path ? previous.Result.Syntax : null;
        return new(SheetRunner.Run(SheetSyntax.Parse(source, earlier), options), version);
    }

    public SheetResult Result { get; }

    public int Version { get; }

    public SourceText Source => Result.Syntax.Source;

    public string Text => Source.Text;

    public string? Path => Source.Path;

    public SymbolIndex Index => _index.Value;
}
