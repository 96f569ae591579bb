using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

public sealed record HeadingResult(HeadingSyntax Heading, int Line) : StatementResult(Heading, Line);
