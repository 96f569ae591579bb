using CutSheet.Language.Results;

namespace CutSheet.Cli.Output;

/// <summary>
/// A check's comparison as written in the sheet (<c>T &lt;= 2 N·m</c>). <see cref="CheckResult.Text"/> carries
/// the substituted values instead, and only "not evaluated" when the operands are unknown.
/// </summary>
internal static class CheckExpression
{
    public static string Of(SheetResult result, CheckResult check) =>
        CliApp.OneLine(result.Syntax.Source.Slice(check.Check.Condition.Span));
}
