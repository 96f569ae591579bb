namespace CutSheet.Language.Tests.Oracles;

/// <summary>An oracle's answer to one query: the number in the target unit, or null with the oracle's own words.</summary>
public sealed record OracleAnswer(double? Value, string Text);
