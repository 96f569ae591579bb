using System.Buffers;

namespace CutSheet.Language.Syntax;

/// <summary>
/// The tokenizer's growing run of tokens, kept in an array rented from the shared pool, and copied
/// once into an array of the exact size at the end. A list sized from a guess used to grow into a
/// fresh large-object-heap array on a long sheet and then be copied again, three large arrays per
/// sheet, each zeroed. A mutable struct: keep one owner at a time (a local variable, or the caller
/// it is returned to), and hand the array back with <see cref="Release"/>; should the owner throw
/// first, the array is simply not handed back and the collector takes it.
/// </summary>
internal struct TokenBuffer
{
    private SyntaxToken[] _items;
    private int _count;

    public TokenBuffer(int capacity)
    {
        _items = ArrayPool<SyntaxToken>.Shared.Rent(Math.Max(capacity, 16));
        _count = 0;
    }

    public readonly int Count => _count;

    public void Add(SyntaxToken token)
    {
        if (_count == _items.Length) Grow();
        _items[_count++] = token;
    }

    public readonly ReadOnlySpan<SyntaxToken> AsSpan() => _items.AsSpan(0, _count);

    /// <summary>The tokens in a new array of their exact count.</summary>
    public readonly SyntaxToken[] ToArray() => _items.AsSpan(0, _count).ToArray();

    /// <summary>Returns the rented array to the pool; the buffer is empty afterwards.</summary>
    public void Release()
    {
        // Tokens hold no references, so the array need not be cleared for the next renter.
        if (_items.Length > 0) ArrayPool<SyntaxToken>.Shared.Return(_items);
        _items = [];
        _count = 0;
    }

    private void Grow()
    {
        var larger = ArrayPool<SyntaxToken>.Shared.Rent(_items.Length * 2);
        _items.AsSpan(0, _count).CopyTo(larger);
        ArrayPool<SyntaxToken>.Shared.Return(_items);
        _items = larger;
    }
}
