using System.Text;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Editing.Formatting;

/// <summary>
/// One statement line taken apart for the formatter: a definition's name (kept apart so the
/// <c>=</c> can be aligned), the code after it with its spacing decided, and the trailing
/// comment with the column it was written in.
/// </summary>
internal sealed class LineLayout
{
    private string _name = "";
    private string _code = "";
    private string? _comment;
    private int _commentColumn;
    private int _nameWidth;

    public bool IsDefinition { get; private init; }

    public int NameWidth => _name.Length;

    public static LineLayout? Read(SheetSyntax syntax, int line, StatementSyntax statement)
    {
        var source = syntax.Source;
        int lineStart = source.LineStart(line), lineEnd = source.LineEnd(line);
        var tokens = syntax.Tokens.Where(t => t.Start >= lineStart && t.End <= lineEnd && t.Length > 0).ToList();
        var layout = new LineLayout { IsDefinition = statement is DefinitionSyntax };
        int comment = tokens.FindIndex(t => t.Kind == TokenKind.Comment);
        if (comment >= 0)
        {
            layout._comment = source.Slice(tokens[comment].Span);
            layout._commentColumn = tokens[comment].Start - lineStart;
            tokens = tokens.Take(comment).ToList();
        }
        var code = tokens.Where(t => t.Kind != TokenKind.Whitespace).ToList();
        if (code.Count == 0) return null;
        int first = 0;
        if (statement is DefinitionSyntax d)
        {
            // Exactly: name '=' …; anything else between them is left alone.
            if (code.Count < 3 || code[0].Span != d.NameSpan || code[1].Kind != TokenKind.Equals) return null;
            layout._name = source.Slice(d.NameSpan);
            first = 2;
        }
        var text = new StringBuilder();
        bool previousSpaced = false;
        for (int i = first; i < code.Count; i++)
        {
            var token = code[i];
            bool spaced = i > 0 && IsSpacedOperator(token.Kind, code[i - 1].Kind);
            if (i > first)
                text.Append(spaced || previousSpaced ? " " : source.Text.AsSpan(code[i - 1].End, token.Start - code[i - 1].End));
            text.Append(source.Text, token.Start, token.Length);
            previousSpaced = spaced;
        }
        layout._code = text.ToString();
        layout._nameWidth = layout._name.Length;
        return layout;
    }

    public void AlignTo(int width) => _nameWidth = Math.Max(width, _name.Length);

    public string Render()
    {
        var line = new StringBuilder();
        if (IsDefinition) line.Append(_name).Append(' ', _nameWidth - _name.Length).Append(" = ");
        line.Append(_code);
        string body = line.ToString();
        if (_comment is null) return body;
        // Keep the comment in its column where the code leaves room; otherwise one space after the code.
        return body + new string(' ', Math.Max(1, _commentColumn - body.Length)) + _comment;
    }

    /// <summary>Operators written with a space on each side. A minus after an operator or bracket is a sign and stays tight.</summary>
    private static bool IsSpacedOperator(TokenKind kind, TokenKind previous) => kind switch
    {
        TokenKind.Plus or TokenKind.EqualEqual or TokenKind.NotEqual or TokenKind.Less or TokenKind.LessEqual
            or TokenKind.Greater or TokenKind.GreaterEqual => true,
        TokenKind.Minus => previous is TokenKind.Number or TokenKind.Unit or TokenKind.Identifier or TokenKind.RParen
            or TokenKind.RBracket or TokenKind.SuperscriptPower,
        _ => false,
    };
}
