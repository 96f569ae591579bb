namespace CutSheet.Language.Semantics;

/// <summary>A set of named options declared with <c>choice</c>.</summary>
public sealed class ChoiceType(string name, string? path)
{
    public string Name { get; } = name;
    public string? Path { get; } = path;
    public List<ChoiceOption> Options { get; } = [];
}
