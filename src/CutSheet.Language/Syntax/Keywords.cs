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

    /// <summary>Looks spans up without making a string; got once, since getting it checks the comparer's type.</summary>
    private static readonly Dictionary<string, TokenKind>.AlternateLookup<ReadOnlySpan<char>> Lookup = Map.GetAlternateLookup<ReadOnlySpan<char>>();

    private static readonly int ShortestLength = Map.Keys.Min(k => k.Length);
    private static readonly int LongestLength = Map.Keys.Max(k => k.Length);

    /// <summary>
    /// Bit <c>c - 'a'</c> is set when a keyword starts with the letter <c>c</c>. The tokenizer asks about
    /// every name and every word after a number; most are no keyword, and this answers them without hashing.
    /// </summary>
    private static readonly int FirstLetters = Map.Keys.Aggregate(0, (mask, k) => mask | 1 << (k[0] - 'a'));

    public static IEnumerable<string> All => Map.Keys;

    public static bool TryGet(ReadOnlySpan<char> word, out TokenKind kind)
    {
        // Every keyword is lower-case ASCII.
        if (word.Length < ShortestLength || word.Length > LongestLength || !char.IsAsciiLetterLower(word[0])
            || (FirstLetters & 1 << (word[0] - 'a')) == 0)
        {
            kind = TokenKind.None;
            return false;
        }
        return Lookup.TryGetValue(word, out kind);
    }

    public static bool IsKeyword(TokenKind kind) => kind >= TokenKind.If;
}
