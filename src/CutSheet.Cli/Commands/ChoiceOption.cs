using System.CommandLine;
using System.CommandLine.Parsing;

namespace CutSheet.Cli.Commands;

/// <summary>
/// An option that takes one word from a fixed list. Written by hand rather than with
/// <c>AcceptOnlyFromAmong</c> so that a wrong word gives our one-line message and the help shows the words.
/// When the option is absent its value is <c>default(T)</c>: the first member of an enum, or null.
/// </summary>
internal static class ChoiceOption
{
    public static Option<T> Create<T>(string name, string description, params (string Word, T Value)[] choices)
    {
        // The parser's own "[default: …]" would print the enum member's name (Text); name the word instead.
        string? defaultWord = choices.FirstOrDefault(c => EqualityComparer<T>.Default.Equals(c.Value, default!)).Word;
        return new Option<T>(name)
        {
            Description = defaultWord is null ? description : $"{description} [default: {defaultWord}]",
            HelpName = string.Join('|', choices.Select(c => c.Word)),
            CustomParser = result => Parse(result, name, choices),
        };
    }

    private static T Parse<T>(ArgumentResult result, string name, (string Word, T Value)[] choices)
    {
        if (result.Tokens.Count == 0) return default!;
        string given = result.Tokens[^1].Value;
        foreach (var (word, value) in choices)
        {
            if (string.Equals(word, given, StringComparison.OrdinalIgnoreCase)) return value;
        }
        result.AddError($"{name} expects one of {string.Join(", ", choices.Select(c => c.Word))}, not '{given}'");
        return default!;
    }
}
