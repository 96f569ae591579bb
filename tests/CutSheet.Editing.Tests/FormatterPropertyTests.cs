using System.Runtime.CompilerServices;
using CutSheet.Editing.Analysis;
using CutSheet.Editing.Formatting;
using CutSheet.Language.Syntax;

namespace CutSheet.Editing.Tests;

/// <summary>
/// The formatter over every sheet of the repository (examples, test sheets, the library): it
/// keeps every significant token and every comment, and formatting its output changes nothing.
/// </summary>
public sealed class FormatterPropertyTests
{
    private static string Root([CallerFilePath] string here = "") => Path.GetFullPath(Path.Combine(Path.GetDirectoryName(here)!, "..", ".."));

    public static IEnumerable<object[]> Sheets() =>
        new[] { "examples", "tests", "src/CutSheet.Language/Library" }
            .Select(d => Path.Combine(Root(), d))
            .Where(Directory.Exists)
            .SelectMany(d => Directory.EnumerateFiles(d, "*.cutsheet", SearchOption.AllDirectories))
            .Where(p => !p.Contains($"{Path.DirectorySeparatorChar}bin{Path.DirectorySeparatorChar}", StringComparison.Ordinal)
                && !p.Contains($"{Path.DirectorySeparatorChar}Cases{Path.DirectorySeparatorChar}", StringComparison.Ordinal))
            .OrderBy(p => p, StringComparer.Ordinal)
            .Select(p => new object[] { Path.GetRelativePath(Root(), p) });

    [Theory]
    [MemberData(nameof(Sheets))]
    public void Keeps_tokens_and_comments_and_is_stable(string relativePath)
    {
        string text = File.ReadAllText(Path.Combine(Root(), relativePath));
        string once = Apply(text);
        Assert.Equal(Significant(text), Significant(once));
        Assert.Equal(text.Split('\n').Length, once.Split('\n').Length); // no line added or removed: comments stay on their lines
        Assert.Equal(once, Apply(once));
    }

    private static string Apply(string text)
    {
        var analysis = SheetAnalysis.Evaluate(text, null, 1);
        foreach (var e in SheetFormatter.Format(analysis).OrderByDescending(e => e.Span.Start))
            text = text.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText);
        return text;
    }

    private static List<string> Significant(string text)
    {
        var syntax = SheetSyntax.Parse(text);
        return syntax.Tokens.Where(t => t.Kind is not (TokenKind.Whitespace or TokenKind.TriviaNewline))
            .Select(t => t.Kind + ":" + syntax.Source.Slice(t.Span)).ToList();
    }
}
