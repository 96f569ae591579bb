using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

/// <summary>A caution statement of the sheet: whether its condition held (null when unknown).</summary>
public sealed record CautionStatementResult(CautionSyntax Caution, int Line, bool? Fired) : StatementResult(Caution, Line);
