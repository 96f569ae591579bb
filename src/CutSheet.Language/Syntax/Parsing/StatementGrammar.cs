using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;
using Superpower;
using Superpower.Model;
using TextSpan = CutSheet.Language.Text.TextSpan;
using Superpower.Parsers;
using static CutSheet.Language.Syntax.Parsing.TokenSpans;

namespace CutSheet.Language.Syntax.Parsing;

/// <summary>
/// The statement grammar. Each statement kind has its own parser, chosen by the statement's
/// first token; clauses (<c>assumed</c>, <c>source</c>, <c>accepted</c>, <c>where</c>, <c>valid</c>,
/// <c>require</c>, cautions, table rows) are read uniformly after any statement.
/// </summary>
internal static class StatementGrammar
{
    private static readonly TokenListParser<TokenKind, ExpressionSyntax> Expr = ExpressionGrammar.Expression;

    private static readonly TokenListParser<TokenKind, LocalDefinitionSyntax> Binding =
        from name in TokenParsers.Of(TokenKind.Identifier)
        from eq in TokenParsers.Of(TokenKind.Equals)
        from value in Expr
        select new LocalDefinitionSyntax(Of(name).Cover(value.Span), name.ToStringValue(), Of(name), value);

    private static readonly TokenListParser<TokenKind, CautionLevel> Level =
        TokenParsers.Of(TokenKind.Notice).Value(CautionLevel.Notice)
            .Or(TokenParsers.Of(TokenKind.Caution).Value(CautionLevel.Caution))
            .Or(TokenParsers.Of(TokenKind.Warning).Value(CautionLevel.Warning));

    public static readonly TokenListParser<TokenKind, CautionSyntax> CautionBody =
        from first in TokenParsers.Of(TokenKind.Notice).Or(TokenParsers.Of(TokenKind.Caution)).Or(TokenParsers.Of(TokenKind.Warning))
        from message in ExpressionGrammar.Text
        from when in TokenParsers.Of(TokenKind.When)
        from condition in Expr
        select new CautionSyntax(Of(first).Cover(condition.Span), LevelOf(first.Kind), message, condition);

    private static readonly TokenListParser<TokenKind, (ExpressionSyntax? low, ExpressionSyntax? high)> Range =
        (from f in TokenParsers.Of(TokenKind.From) from low in Expr from t in TokenParsers.Of(TokenKind.To) from high in Expr
         select ((ExpressionSyntax?)low, (ExpressionSyntax?)high)).OptionalOrDefault();

    private static readonly TokenListParser<TokenKind, TableCellSyntax> Cell =
        from column in TokenParsers.Of(TokenKind.Identifier)
        from eq in TokenParsers.Of(TokenKind.Equals)
        from value in Expr
        from range in Range
        select new TableCellSyntax(Of(column).Cover(range.high?.Span ?? value.Span), column.ToStringValue(), Of(column), value, range.low, range.high);

    private static readonly TokenListParser<TokenKind, TableRowSyntax> Row =
        from row in TokenParsers.Of(TokenKind.Row)
        from key in TokenParsers.Of(TokenKind.Identifier)
        from colon in TokenParsers.Of(TokenKind.Colon)
        from cells in Cell.AtLeastOnceDelimitedBy(TokenParsers.Of(TokenKind.Comma))
        from source in TokenParsers.Of(TokenKind.Source).Where(s => s.Span.Position.Line == row.Span.Position.Line)
            .IgnoreThen(ExpressionGrammar.Text).Select(t => (TextValueSyntax?)t).Try().OptionalOrDefault()
        select new TableRowSyntax(Of(row).Cover(source?.Span ?? cells[^1].Span), key.ToStringValue(), Of(key), cells, source);

    private static readonly TokenListParser<TokenKind, (string Keyword, TextSpan Span, object? Node)> Clause =
        TokenParsers.Of(TokenKind.Assumed).Select(t => ("assumed", Of(t), (object?)null))
            .Or(from t in TokenParsers.Of(TokenKind.Source) from s in ExpressionGrammar.Text select ("source", Of(t), (object?)s))
            .Or(from t in TokenParsers.Of(TokenKind.Accepted) from s in ExpressionGrammar.Text select ("accepted", Of(t), (object?)s))
            .Or(from t in TokenParsers.Of(TokenKind.Where) from b in Binding select ("where", Of(t), (object?)b))
            .Or(from t in TokenParsers.Of(TokenKind.Valid) from c in Expr from m in ExpressionGrammar.OptionalText
                select ("valid", Of(t), (object?)new ConditionClauseSyntax(Of(t).Cover(m?.Span ?? c.Span), c, m)))
            .Or(from t in TokenParsers.Of(TokenKind.Require) from c in Expr from m in ExpressionGrammar.OptionalText
                select ("require", Of(t), (object?)new ConditionClauseSyntax(Of(t).Cover(m?.Span ?? c.Span), c, m)))
            .Or(CautionBody.Select(c => ("caution", c.Span, (object?)c)))
            .Or(Row.Select(r => ("row", TextSpan.FromBounds(r.Span.Start, r.Span.Start + 3), (object?)r)));

    /// <summary>Zero or more clauses, to the end of the statement.</summary>
    public static readonly TokenListParser<TokenKind, ClausesSyntax> Clauses =
        Clause.Many().Select(BuildClauses);

    /// <summary><see cref="Clauses"/> that must reach the end of the tokens: what follows a directly parsed statement.</summary>
    public static readonly TokenListParser<TokenKind, ClausesSyntax> ClausesToEnd = Clauses.AtEnd();

    private static readonly TokenListParser<TokenKind, StatementSyntax> Definition =
        from b in Binding
        from clauses in Clauses
        select (StatementSyntax)new DefinitionSyntax(b.Span, b.Name, b.NameSpan, b.Value) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, ParameterSyntax> Parameter =
        from name in TokenParsers.Of(TokenKind.Identifier)
        from colon in TokenParsers.Of(TokenKind.Colon)
        from kind in TokenParsers.Of(TokenKind.Identifier)
        from def in ExpressionGrammar.After(TokenKind.Equals)
        select new ParameterSyntax(Of(name).Cover(def?.Span ?? Of(kind)), name.ToStringValue(), Of(name), kind.ToStringValue(), Of(kind), def);

    /// <summary>The part of a function before its formula; used alone to recover when the formula does not parse.</summary>
    public static readonly TokenListParser<TokenKind, (Token<TokenKind> Name, ParameterSyntax[] Parameters, Token<TokenKind> Kind)> FunctionHeader =
        from name in TokenParsers.Of(TokenKind.Identifier)
        from open in TokenParsers.Of(TokenKind.LParen)
        from parameters in Parameter.ManyDelimitedBy(TokenParsers.Of(TokenKind.Comma))
        from close in TokenParsers.Of(TokenKind.RParen)
        from colon in TokenParsers.Of(TokenKind.Colon)
        from kind in TokenParsers.Of(TokenKind.Identifier)
        from eq in TokenParsers.Of(TokenKind.Equals)
        select (name, parameters, kind);

    private static readonly TokenListParser<TokenKind, StatementSyntax> Function =
        from header in FunctionHeader
        from body in Expr
        from clauses in Clauses
        select (StatementSyntax)new FunctionSyntax(Of(header.Name).Cover(body.Span), header.Name.ToStringValue(), Of(header.Name),
            header.Parameters, header.Kind.ToStringValue(), Of(header.Kind), body) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, StatementSyntax> Check =
        from check in TokenParsers.Of(TokenKind.Check)
        from condition in Expr
        from tolerance in ExpressionGrammar.After(TokenKind.Within)
        from clauses in Clauses
        select (StatementSyntax)new CheckSyntax(Of(check).Cover(tolerance?.Span ?? condition.Span), condition, tolerance) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, StatementSyntax> Caution =
        from c in CautionBody
        from clauses in Clauses
        select (StatementSyntax)(c with { Clauses = clauses });

    private static readonly TokenListParser<TokenKind, (string, TextSpan)> Alias =
        TokenParsers.Of(TokenKind.As).IgnoreThen(TokenParsers.Of(TokenKind.Identifier).Or(TokenParsers.Of(TokenKind.Unit)))
            .Select(t => (t.ToStringValue(), Of(t)));

    private static readonly TokenListParser<TokenKind, (LocalDefinitionSyntax[] list, TextSpan close)> Overrides =
        (from w in TokenParsers.Of(TokenKind.With)
        from open in TokenParsers.Of(TokenKind.LParen)
        from list in Binding.ManyDelimitedBy(TokenParsers.Of(TokenKind.Comma))
        from close in TokenParsers.Of(TokenKind.RParen)
        select (list, Of(close))).OptionalOrDefault();

    private static readonly TokenListParser<TokenKind, StatementSyntax> Use =
        from use in TokenParsers.Of(TokenKind.Use)
        from target in TokenParsers.Of(TokenKind.Identifier).Or(TokenParsers.Of(TokenKind.String))
        from alias in Alias.OptionalOrDefault()
        from overrides in Overrides
        select (StatementSyntax)new UseSyntax(
            TextSpan.FromBounds(Of(use).Start, overrides.Item1 is null ? (alias.Item1 is null ? Of(target).End : alias.Item2.End) : overrides.Item2.End),
            target.Kind == TokenKind.String ? StringText.Value(target.ToStringValue()) : target.ToStringValue(),
            target.Kind == TokenKind.String, Of(target), alias.Item1, alias.Item2, overrides.Item1 ?? []);

    private static readonly TokenListParser<TokenKind, StatementSyntax> Sheet =
        from sheet in TokenParsers.Of(TokenKind.Sheet)
        from key in TokenParsers.Of(TokenKind.Identifier)
        from value in ExpressionGrammar.Text
        select (StatementSyntax)new SheetMetadataSyntax(Of(sheet).Cover(value.Span), key.ToStringValue(), Of(key), value);

    private static readonly TokenListParser<TokenKind, StatementSyntax> Display =
        from display in TokenParsers.Of(TokenKind.Display)
        from setting in TokenParsers.Of(TokenKind.Identifier)
        from value in TokenParsers.Of(TokenKind.Identifier).Or(TokenParsers.Of(TokenKind.Number)).Or(TokenParsers.Of(TokenKind.Unit))
        select (StatementSyntax)new DisplaySyntax(Of(display).Cover(Of(value)), setting.ToStringValue(), Of(setting), value.ToStringValue(), Of(value));

    private static readonly TokenListParser<TokenKind, StatementSyntax> Choice =
        from choice in TokenParsers.Of(TokenKind.Choice)
        from name in TokenParsers.Of(TokenKind.Identifier)
        from eq in TokenParsers.Of(TokenKind.Equals)
        from options in TokenParsers.Of(TokenKind.Identifier).AtLeastOnceDelimitedBy(TokenParsers.Of(TokenKind.Bar))
        from clauses in Clauses
        select (StatementSyntax)new ChoiceSyntax(Of(choice).Cover(Of(options[^1])), name.ToStringValue(), Of(name),
            options.Select(o => (o.ToStringValue(), Of(o))).ToArray()) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, StatementSyntax> Table =
        from table in TokenParsers.Of(TokenKind.Table)
        from name in TokenParsers.Of(TokenKind.Identifier)
        from open in TokenParsers.Of(TokenKind.LParen)
        from key in TokenParsers.Of(TokenKind.Identifier)
        from close in TokenParsers.Of(TokenKind.RParen)
        from clauses in Clauses
        select (StatementSyntax)new TableSyntax(Between(table, close), name.ToStringValue(), Of(name), key.ToStringValue(), Of(key)) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, StatementSyntax> KindDeclaration =
        from keyword in TokenParsers.Of(TokenKind.KindKeyword)
        from name in TokenParsers.Of(TokenKind.Identifier)
        from eq in TokenParsers.Of(TokenKind.Equals)
        from basis in TokenParsers.Of(TokenKind.Identifier)
        from clauses in Clauses
        select (StatementSyntax)new KindDeclarationSyntax(Between(keyword, basis), name.ToStringValue(), Of(name), basis.ToStringValue(), Of(basis)) { Clauses = clauses };

    private static readonly TokenListParser<TokenKind, StatementSyntax> FunctionToEnd = Function.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> DefinitionToEnd = Definition.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> CheckToEnd = Check.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> CautionToEnd = Caution.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> UseToEnd = Use.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> SheetToEnd = Sheet.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> DisplayToEnd = Display.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> ChoiceToEnd = Choice.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> TableToEnd = Table.AtEnd();
    private static readonly TokenListParser<TokenKind, StatementSyntax> KindDeclarationToEnd = KindDeclaration.AtEnd();

    /// <summary>The parser for a statement that starts with the given tokens, or null when no statement starts so; built once.</summary>
    public static TokenListParser<TokenKind, StatementSyntax>? For(TokenKind first, TokenKind second) => first switch
    {
        TokenKind.Identifier when second == TokenKind.LParen => FunctionToEnd,
        TokenKind.Identifier when second == TokenKind.Equals => DefinitionToEnd,
        TokenKind.Check => CheckToEnd,
        TokenKind.Notice or TokenKind.Caution or TokenKind.Warning => CautionToEnd,
        TokenKind.Use => UseToEnd,
        TokenKind.Sheet => SheetToEnd,
        TokenKind.Display => DisplayToEnd,
        TokenKind.Choice => ChoiceToEnd,
        TokenKind.Table => TableToEnd,
        TokenKind.KindKeyword => KindDeclarationToEnd,
        _ => null,
    };

    private static CautionLevel LevelOf(TokenKind kind) => kind switch
    {
        TokenKind.Notice => CautionLevel.Notice,
        TokenKind.Warning => CautionLevel.Warning,
        _ => CautionLevel.Caution,
    };

    private static ClausesSyntax BuildClauses((string Keyword, TextSpan Span, object? Node)[] clauses)
    {
        if (clauses.Length == 0) return ClausesSyntax.Empty;
        TextSpan? assumed = null;
        TextValueSyntax? source = null, accepted = null;
        var locals = new List<LocalDefinitionSyntax>();
        var valid = new List<ConditionClauseSyntax>();
        var require = new List<ConditionClauseSyntax>();
        var cautions = new List<CautionSyntax>();
        var rows = new List<TableRowSyntax>();
        foreach (var (keyword, span, node) in clauses)
        {
            switch (keyword)
            {
                case "assumed": assumed = span; break;
                case "source": source = (TextValueSyntax)node!; break;
                case "accepted": accepted = (TextValueSyntax)node!; break;
                case "where": locals.Add((LocalDefinitionSyntax)node!); break;
                case "valid": valid.Add((ConditionClauseSyntax)node!); break;
                case "require": require.Add((ConditionClauseSyntax)node!); break;
                case "caution": cautions.Add((CautionSyntax)node!); break;
                case "row": rows.Add((TableRowSyntax)node!); break;
            }
        }
        return new ClausesSyntax
        {
            Assumed = assumed, Source = source, Accepted = accepted, Locals = locals, Valid = valid, Require = require,
            Cautions = cautions, Rows = rows, Keywords = clauses.Select(c => (c.Keyword, c.Span)).ToArray(),
        };
    }
}
