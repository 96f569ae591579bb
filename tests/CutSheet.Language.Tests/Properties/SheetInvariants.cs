using System.Text.RegularExpressions;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax;
using CutSheet.Language.Tests.Support;
using Xunit.Sdk;

namespace CutSheet.Language.Tests.Properties;

/// <summary>
/// What must hold for every text whatsoever (ARCHITECTURE.md "parsing never throws on any
/// input"; LANGUAGE.md H "nothing crashes or hangs: every error has a position, a code";
/// LANGUAGE.md "File": parse → print is lossless):
/// parsing and evaluation finish in bounded time without throwing; the tokens tile the text
/// and print it back exactly; every span lies inside the text; every diagnostic has a CUT code
/// and a message; a check reported as passed has both its sides.
/// </summary>
public static partial class SheetInvariants
{
    [GeneratedRegex(@"^CUT\d{4}$")]
    private static partial Regex CodePattern();

    public static SheetResult AssertHold(string text)
    {
        var syntax = Bounded.Run(() => SheetSyntax.Parse(text), "SheetSyntax.Parse");
        AssertTokensTile(syntax, text);
        if (syntax.Print() != text) Fail("Print() differs from the text");
        foreach (var s in syntax.Statements) AssertInside(s.Span, text, $"statement {s.GetType().Name}");

        var result = Bounded.Run(() => SheetRunner.Run(text), "SheetRunner.Run");
        foreach (var d in result.Diagnostics)
        {
            if (!CodePattern().IsMatch(d.Code)) Fail($"diagnostic code '{d.Code}' is not CUTnnnn");
            if (string.IsNullOrWhiteSpace(d.Message)) Fail($"{d.Code} has no message");
            if (d.Path is null) AssertInside(d.Span, text, $"{d.Code} '{d.Message}'");
        }
        foreach (var c in result.Checks)
        {
            if (c.Status == CheckStatus.Passed && (c.Value is null || c.Limit is null)) Fail($"check on line {c.Line + 1} passed without both sides");
        }
        return result;
    }

    private static void AssertTokensTile(SheetSyntax syntax, string text)
    {
        int end = 0;
        foreach (var t in syntax.Tokens)
        {
            if (t.Start != end || t.Length <= 0) Fail($"token {t.Kind} at {t.Start} (length {t.Length}) does not follow the previous one ending at {end}");
            end = t.End;
        }
        if (end != text.Length) Fail($"tokens end at {end}, the text at {text.Length}");
    }

    private static void AssertInside(Text.TextSpan span, string text, string what)
    {
        if (span.Start < 0 || span.Length < 0 || span.End > text.Length) Fail($"{what}: span {span} lies outside the text of length {text.Length}");
    }

    private static void Fail(string message) => throw new XunitException(message);
}
