using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    /// <summary>The zero-based line of each statement, by statement index; filled by <see cref="Declare"/>.</summary>
    private int[] _statementLines = [];

    /// <summary>
    /// Finds statement <paramref name="index"/>'s line, walking forward from the previous statement's:
    /// statements come in text order, so no statement's line is searched for in the whole sheet.
    /// </summary>
    private int MapLine(int index, int previousLine)
    {
        int start = Math.Clamp(_statements[index].Span.Start, 0, _source.Length);
        int line = previousLine;
        if (start < _source.LineStart(line))
        {
            // Out of text order (never produced by the parser today): fall back to the search.
            line = LineOf(_statements[index].Span);
        }
        else
        {
            while (line + 1 < _source.LineCount && _source.LineStart(line + 1) <= start) line++;
        }
        _statementLines[index] = line;
        return line;
    }

    /// <summary>The line of a span inside statement <paramref name="index"/>: its own line when it starts there, else searched.</summary>
    private int LineWithin(int index, TextSpan span)
    {
        int line = _statementLines[index];
        int start = span.Start;
        bool onLine = start >= _source.LineStart(line) && (line + 1 >= _source.LineCount || start < _source.LineStart(line + 1));
        return onLine ? line : LineOf(span);
    }
}
