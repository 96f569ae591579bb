using CutSheet.Language.Evaluation;

namespace CutSheet.Language.Semantics;

/// <summary>A table cell: its typical value and its range, each possibly unknown.</summary>
public sealed record TableCell(Value Typical, Value Low, Value High);
