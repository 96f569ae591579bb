namespace CutSheet.Language.Syntax;

/// <summary>The reserved words of the language.</summary>
public static class Keywords
{
    private static readonly Dictionary<string, TokenKind> Map = new(StringComparer.Ordinal)
    {
        ["if"] = TokenKind.If, ["then"] = TokenKind.Then, ["else"] = TokenKind.Else,
        ["and"] = TokenKind.And, ["or"] = TokenKind.Or, ["not"] = TokenKind.Not,
        ["as"] = TokenKind.As, ["use"] = TokenKind.Use, ["with"] = TokenKind.With,
        ["check"] = TokenKind.Check, ["within"] = TokenKind.Within,
        ["notice"] = TokenKind.Notice, ["caution"] = TokenKind.Caution, ["warning"] = TokenKind.Warning,
        ["when"] = TokenKind.When, ["accepted"] = TokenKind.Accepted, ["assumed"] = TokenKind.Assumed,
        ["source"] = TokenKind.Source, ["sheet"] = TokenKind.Sheet, ["display"] = TokenKind.Display,
        ["valid"] = TokenKind.Valid, ["require"] = TokenKind.Require, ["where"] = TokenKind.Where,
        ["choice"] = TokenKind.Choice, ["table"] = TokenKind.Table, ["row"] = TokenKind.Row,
        ["from"] = TokenKind.From, ["to"] = TokenKind.To, ["true"] = TokenKind.True, ["false"] = TokenKind.False,
        ["kind"] = TokenKind.KindKeyword,
    };

    public static IEnumerable<string> All => Map.Keys;

    public static bool TryGet(ReadOnlySpan<char> word, out TokenKind kind)
    {
        var lookup = Map.GetAlternateLookup<ReadOnlySpan<char>>();
        return lookup.TryGetValue(word, out kind);
    }

    public static bool IsKeyword(TokenKind kind) => kind >= TokenKind.If;
}
