namespace CutSheet.Language.Evaluation;

/// <summary>
/// A slot on a syntax node for something evaluation derives from the node alone, computed on first
/// use and kept. Syntax trees of library sheets are shared across threads and runs, so what goes in
/// must be immutable and a pure function of the node; two threads filling the slot at once store
/// equal values, and either reference is fine. The slot compares equal to any other, so a filled
/// cache never changes the equality or hash of the record that holds it.
/// </summary>
internal struct NodeCache<T> : IEquatable<NodeCache<T>> where T : class
{
    /// <summary>The cached value, or null until first computed.</summary>
    public T? Value;

    public readonly bool Equals(NodeCache<T> other) => true;

    public override readonly bool Equals(object? obj) => obj is NodeCache<T>;

    public override readonly int GetHashCode() => 0;
}
