using CutSheet.Editing.Analysis;

namespace CutSheet.Editing.Symbols;

/// <summary>Every name occurrence of one sheet version, in text order, with what each refers to.</summary>
public sealed class SymbolIndex
{
    private readonly SymbolOccurrence[] _occurrences;

    private SymbolIndex(SymbolOccurrence[] occurrences) => _occurrences = occurrences;

    public IReadOnlyList<SymbolOccurrence> Occurrences => _occurrences;

    public static SymbolIndex Build(SheetAnalysis analysis) =>
        new(new OccurrenceCollector(analysis).Collect().OrderBy(o => o.Span.Start).ToArray());

    /// <summary>The occurrence under the cursor; a cursor just after a name still counts as on it.</summary>
    public SymbolOccurrence? At(int offset) =>
        _occurrences.FirstOrDefault(o => o.Span.Contains(offset)) ?? _occurrences.LastOrDefault(o => o.Span.End == offset);

    public IEnumerable<SymbolOccurrence> Of(SymbolKey key) => _occurrences.Where(o => o.Target.Key == key);
}
