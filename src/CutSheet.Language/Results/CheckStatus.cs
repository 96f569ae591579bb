namespace CutSheet.Language.Results;

/// <summary>The outcome of a check. A check whose operands are unknown is never "passed".</summary>
public enum CheckStatus { Passed, Failed, NotEvaluated }
