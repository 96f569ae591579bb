using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests;

/// <summary>One-line evaluation cases from <c>Cases/*.cases</c>; each line names its source.</summary>
public class EvaluationCaseTests
{
    public static IEnumerable<object[]> Evaluation => CaseFile.Load("evaluation.cases");
    public static IEnumerable<object[]> Rotation => CaseFile.Load("rotation.cases");
    public static IEnumerable<object[]> Lexing => CaseFile.Load("lexing.cases");
    public static IEnumerable<object[]> Kinds => CaseFile.Load("kinds.cases");

    [Theory, MemberData(nameof(Evaluation))]
    public void Evaluates(string where, string input, string expected, string source) => CaseRunner.Run(where, input, expected, source);

    [Theory, MemberData(nameof(Rotation))]
    public void RotationTruthTable(string where, string input, string expected, string source) => CaseRunner.Run(where, input, expected, source);

    [Theory, MemberData(nameof(Lexing))]
    public void LexingTraps(string where, string input, string expected, string source) => CaseRunner.Run(where, input, expected, source);

    [Theory, MemberData(nameof(Kinds))]
    public void KindRules(string where, string input, string expected, string source) => CaseRunner.Run(where, input, expected, source);
}
