using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Evaluation;

internal sealed partial class SheetEvaluator
{
    /// <summary>The zero-based line of each statement, by statement index; filled once by <see cref="MapStatementLines"/>.</summary>
    private int[] _statementLines = [];

    /// <summary>How many statements are definitions: the dictionaries of names are sized from it once.</summary>
    private int _definitionCount;

    /// <summary>
    /// Finds every statement's line in one forward walk over the line starts. Statements come in text
    /// order, so each search starts where the last one ended instead of bisecting the whole sheet
    /// for every statement in every stage.
    /// </summary>
    private void MapStatementLines()
    {
        var statements = _syntax.Statements;
        _statementLines = new int[statements.Count];
        int line = 0;
        int previousStart = 0;
        for (int i = 0; i < statements.Count; i++)
        {
            var statement = statements[i];
            int start = Math.Clamp(statement.Span.Start, 0, _source.Length);
            if (start < previousStart)
            {
                // Out of text order (never produced by the parser today): fall back to the search.
                line = LineOf(statement.Span);
            }
            else
            {
                while (line + 1 < _source.LineCount && _source.LineStart(line + 1) <= start) line++;
            }
            previousStart = start;
            _statementLines[i] = line;
            if (statement is DefinitionSyntax) _definitionCount++;
        }
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
