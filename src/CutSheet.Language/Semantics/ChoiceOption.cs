namespace CutSheet.Language.Semantics;

/// <summary>One option of a <see cref="ChoiceType"/>.</summary>
public sealed record ChoiceOption(ChoiceType Type, string Name, int Index)
{
    public override string ToString() => Name;
}
