using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Results;

/// <summary>
/// A check's outcome. The right side of the comparison is the limit. <see cref="Utilisation"/>
/// is value/limit for <c>&lt;=</c>, limit/value for <c>&gt;=</c> and |value − target|/tolerance
/// for <c>==</c> with a tolerance; null where undefined (a zero or negative limit or value).
/// <see cref="Margin"/> is the distance to the limit on the safe side (positive when passing),
/// shown in the limit's unit.
/// </summary>
public sealed record CheckResult(
    CheckSyntax Check, int Line, CheckStatus Status, string Operator, DisplayedValue? Value, DisplayedValue? Limit,
    double? Utilisation, DisplayedValue? Margin, string? Description, string Text)
    : StatementResult(Check, Line);
