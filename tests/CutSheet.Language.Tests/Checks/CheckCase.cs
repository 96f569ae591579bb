namespace CutSheet.Language.Tests.Checks;

/// <summary>One line of <c>Cases/checks.cases</c>: where it is, the sheet text, the expectations and the working.</summary>
public sealed record CheckCase(string Where, string Sheet, IReadOnlyList<string> Expectations, string Source)
{
    public override string ToString() => Where;
}
