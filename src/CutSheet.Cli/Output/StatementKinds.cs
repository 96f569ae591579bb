using CutSheet.Language.Results;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Cli.Output;

/// <summary>The <c>kind</c> word of each statement in the JSON output.</summary>
internal static class StatementKinds
{
    public static string Of(StatementResult statement) => statement switch
    {
        DefinitionResult => "definition",
        CheckResult => "check",
        CautionStatementResult => "caution",
        HeadingResult => "heading",
        OtherStatementResult other => other.Statement switch
        {
            UseSyntax => "use",
            SheetMetadataSyntax => "metadata",
            DisplaySyntax => "display",
            FunctionSyntax => "function",
            ChoiceSyntax => "choice",
            TableSyntax => "table",
            ErrorStatementSyntax => "error",
            _ => "other",
        },
        _ => "other",
    };

    public static string Status(CheckStatus status) => status switch
    {
        CheckStatus.Passed => "passed",
        CheckStatus.Failed => "failed",
        _ => "notEvaluated",
    };

    public static string Level(CautionLevel level) => level switch
    {
        CautionLevel.Notice => "notice",
        CautionLevel.Caution => "caution",
        _ => "warning",
    };
}
