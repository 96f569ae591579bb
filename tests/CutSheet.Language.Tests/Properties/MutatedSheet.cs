using CutSheet.Language.Tests.Support;

namespace CutSheet.Language.Tests.Properties;

/// <summary>A sheet after edits; prints as the original's name, the edits and the exact text, for the failure report.</summary>
public sealed record MutatedSheet(string Origin, SheetMutation[] Mutations, string Text)
{
    public override string ToString() =>
        $"{Origin} with [{string.Join(", ", Mutations.Select(m => m.ToString()))}]:\n{CSharpLiteral.Of(Text)}";
}
