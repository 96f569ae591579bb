using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// Hands out the statements of an earlier parse of the same sheet that an edit left alone. A
/// statement is taken over only when it starts and ends at the same offsets, its tokens hash the
/// same and its text is the same character for character: a statement's parse reads nothing but
/// its tokens and their text, so the node and the diagnostics are then what a new parse would
/// give. Statements come in text order in both parses, so one forward cursor finds them.
/// </summary>
internal sealed class StatementReuse(SheetSyntax previous)
{
    private readonly StatementRecord[] _records = previous.Records;
    private readonly string _text = previous.Source.Text;
    private int _next;

    public bool TryTake(string text, int start, int end, ulong hash, out StatementSyntax? statement, out ReadOnlySpan<Diagnostic> diagnostics)
    {
        statement = null;
        diagnostics = default;
        while (_next < _records.Length && _records[_next].Start < start) _next++;
        if (_next == _records.Length) return false;
        var r = _records[_next];
        if (r.Start != start || r.End != end || r.TokenHash != hash || end > _text.Length || end > text.Length) return false;
        if (!_text.AsSpan(start, end - start).SequenceEqual(text.AsSpan(start, end - start))) return false;
        _next++;
        statement = r.Statement;
        diagnostics = System.Runtime.InteropServices.CollectionsMarshal.AsSpan(previous.DiagnosticList).Slice(r.DiagnosticStart, r.DiagnosticCount);
        return true;
    }
}
