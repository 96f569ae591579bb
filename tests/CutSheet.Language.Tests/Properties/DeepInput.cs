namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// A sheet built to stress nesting or size, the name it is reported under, the definition to
/// look at, and what it must give: <see cref="Expected"/> is the value in SI (hand-computed,
/// invariant-culture text), "true", or "none" when no value is possible and an error must say why.
/// </summary>
public sealed record DeepInput(string Name, Func<string> Build, string Definition, string Expected)
{
    public override string ToString() => Name;
}
