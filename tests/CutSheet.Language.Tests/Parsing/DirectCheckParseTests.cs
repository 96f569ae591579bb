using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Syntax.Parsing;
using CutSheet.Language.Tests.Support;
using CutSheet.Language.Text;

namespace CutSheet.Language.Tests.Parsing;

/// <summary>
/// A <c>check</c> is parsed directly by the sheet parser (the hot path) and falls back to the
/// statement grammar only when it does not parse. The direct parse must build the very statement
/// the grammar builds. The expected value of each case is the grammar's own parse of the same
/// line (a differential test), dumped with <see cref="SyntaxDumper"/>.
/// </summary>
public class DirectCheckParseTests
{
    public static TheoryData<string> Lines => new(
    [
        "check F <= 25 N",
        "check F >= 5 N // a description",
        "check 10.02 mm == 10 mm within 0.05 mm",
        "check a != b within 2 % source \"a handbook\"",
        "check F <= 25 N accepted \"reviewed\" assumed",
        "check (a + b) * 2 <= 10 m as mm",
        "check lead_angle(lead: 5 mm/rev, d: d0) <= 3 deg",
        "check if a > b then a else b <= 4 kN",
        "check not (a < b) and c",
        "check max([1 mm, 2 mm]) <= 3 mm",
        "check t[k].col <= 2 m",
        "check x² + y^-2 <= 1 m²",
        "check -F <= 0 N within 1 N\n  source \"data\"",
        "check 3/8 in <= 1 in",
        "check 1 1/4 in <= 2 in within 1/16 in",
        "check m.f(1) <= 2",
    ]);

    [Theory, MemberData(nameof(Lines))]
    public void BuildsWhatTheGrammarBuilds(string line)
    {
        var source = new SourceText(line);
        var tokens = Tokenizer.Tokenize(line).Where(t => !t.IsTrivia && t.Kind != TokenKind.Newline && t.Kind != TokenKind.Comment).ToArray();
        var grammar = StatementGrammar.For(TokenKind.Check, tokens[1].Kind)!(SheetParser.ToTokenList(source, tokens));
        Assert.True(grammar.HasValue, $"the grammar does not parse '{line}'");

        var direct = SheetSyntax.Parse(source);
        Assert.Empty(direct.Diagnostics);
        var statement = Assert.Single(direct.Statements);
        // The grammar leaves the description (the comment) to the sheet parser; compare without it.
        var withoutDescription = statement with { Clauses = statement.Clauses with { Description = null } };
        Assert.Equal(Dump(source, grammar.Value), Dump(source, withoutDescription));
    }

    private static string Dump(SourceText source, StatementSyntax statement) =>
        SyntaxDumper.Dump(new SheetSyntax(source, [statement], [], []));
}
