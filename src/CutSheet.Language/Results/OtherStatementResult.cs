using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

/// <summary>Statements with no value of their own: imports, settings, metadata, functions, choices, tables.</summary>
public sealed record OtherStatementResult(StatementSyntax Statement, int Line) : StatementResult(Statement, Line);
