using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax;

/// <summary>
/// A parsed sheet: its text, every token (trivia included, so the tokens reproduce the text),
/// the statements in order and the syntax diagnostics. Parsing never throws.
/// </summary>
public sealed class SheetSyntax
{
    /// <summary>Every token, made when first asked for.</summary>
    private SyntaxToken[]? _tokens;

    internal SheetSyntax(SourceText source, IReadOnlyList<StatementSyntax> statements, List<Diagnostic> diagnostics, Parsing.StatementRecord[] records)
    {
        Source = source;
        Statements = statements;
        DiagnosticList = diagnostics;
        Records = records;
    }

    /// <summary>What each statement's parse gave, for the next parse of an edited version (see <see cref="Parse(SourceText, SheetSyntax?)"/>).</summary>
    internal Parsing.StatementRecord[] Records { get; }

    internal List<Diagnostic> DiagnosticList { get; }

    public SourceText Source { get; }

    /// <summary>
    /// Every token, whitespace included, as <see cref="Tokenizer.Tokenize(string)"/> gives them. Only the
    /// editor asks for them, so the parse does not keep them (it reads the significant tokens from a
    /// pooled buffer): the text is tokenized again on first use. Two threads asking at once may both
    /// tokenize; one list is kept.
    /// </summary>
    public IReadOnlyList<SyntaxToken> Tokens =>
        _tokens ?? Interlocked.CompareExchange(ref _tokens, Tokenizer.Tokenize(Source.Text), null) ?? _tokens;

    public IReadOnlyList<StatementSyntax> Statements { get; }

    public IReadOnlyList<Diagnostic> Diagnostics => DiagnosticList;

    /// <summary>The text again, from the tokens: equal to the source for every input.</summary>
    public string Print()
    {
        var sb = new System.Text.StringBuilder(Source.Length);
        foreach (var t in Tokens) sb.Append(Source.Text, t.Start, t.Length);
        return sb.ToString();
    }

    /// <summary>Parses sheet text; never throws.</summary>
    public static SheetSyntax Parse(string text, string? path = null) => Parsing.SheetParser.Parse(new SourceText(text, path), null, keepRecords: false);

    public static SheetSyntax Parse(SourceText source) => Parsing.SheetParser.Parse(source, null, keepRecords: false);

    /// <summary>
    /// Parses an edited version of a sheet, taking over from <paramref name="previous"/> (an earlier
    /// parse of the same sheet) every statement whose text and place the edit left unchanged. The
    /// result is the same as a fresh parse; an editor that re-parses on every keystroke saves the
    /// parse of all but the edited statements. Pass null for the first version: only a parse made
    /// through this overload keeps what a later one can take over.
    /// </summary>
    public static SheetSyntax Parse(SourceText source, SheetSyntax? previous) => Parsing.SheetParser.Parse(source, previous, keepRecords: true);
}
