namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// A statement's significant tokens, a contiguous range of the sheet's significant tokens
/// (line breaks and trivia dropped; indented clause lines are consecutive, so they extend the
/// range), and the comment on its first line, which is its description.
/// </summary>
internal readonly record struct StatementGroup(int Start, int Count, SyntaxToken? Comment, bool IsFunction);
