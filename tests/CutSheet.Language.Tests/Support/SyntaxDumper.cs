using System.Globalization;
using System.Text;
using CutSheet.Language.Diagnostics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Language.Tests.Support;

/// <summary>
/// A readable dump of a parsed sheet for the parser golden files: one block per statement
/// (node kind, span as <c>line:column-line:column</c>, 1-based, end exclusive, key fields),
/// nested expressions as S-expressions, then the syntax diagnostics (code, severity,
/// line:column, message, fixes). Expression forms:
/// <c>(num TEXT)</c> / <c>(qty TEXT UNIT)</c> for literals, with <c>=VALUE</c> when the number
/// written is not its own round-trip text and <c>fraction</c> for 3/8 in; a bare name or
/// <c>s.name</c>; <c>(OP a b)</c> for binary operators; <c>(neg a)</c>, <c>(pos a)</c>,
/// <c>(not a)</c>; <c>(as a UNIT)</c>; <c>(call f arg (name: arg))</c>; <c>(if c a b)</c>;
/// <c>(list …)</c>; <c>(lookup table key column)</c>; <c>(error "TEXT")</c> for what did not parse.
/// </summary>
public static class SyntaxDumper
{
    public static string Dump(SheetSyntax sheet, IEnumerable<Diagnostic>? runOnlySyntaxDiagnostics = null)
    {
        var source = sheet.Source;
        var sb = new StringBuilder();
        foreach (var s in sheet.Statements) Statement(sb, source, s);
        sb.Append("diagnostics:\n");
        foreach (var d in sheet.Diagnostics) Diagnostic(sb, source, d);
        var extra = runOnlySyntaxDiagnostics?.ToList() ?? [];
        if (extra.Count > 0)
        {
            sb.Append("diagnostics of evaluation with syntax codes:\n");
            foreach (var d in extra) Diagnostic(sb, source, d);
        }
        return sb.ToString();
    }

    private static void Statement(StringBuilder sb, SourceText source, StatementSyntax s)
    {
        string head = s switch
        {
            HeadingSyntax h => $"level={h.Level} text={Quote(h.Text)}",
            DefinitionSyntax d => $"name={d.Name}",
            FunctionSyntax f => $"name={f.Name} returns={f.ReturnKind}",
            CheckSyntax => "",
            CautionSyntax c => $"level={c.Level} message={Quote(c.Message.Value)}",
            UseSyntax u => $"target={(u.IsPath ? Quote(u.Target) : u.Target)}" + (u.Alias is null ? "" : $" alias={u.Alias}"),
            SheetMetadataSyntax m => $"key={m.Key} value={Quote(m.Value.Value)}",
            DisplaySyntax d => $"setting={d.Setting} value={d.Value}",
            ChoiceSyntax c => $"name={c.Name} options=[{string.Join(", ", c.Options.Select(o => o.Name))}]",
            TableSyntax t => $"name={t.Name} key={t.KeyChoice}",
            ErrorStatementSyntax => $"text={Quote(source.Slice(s.Span))}",
            _ => "",
        };
        string kind = s.GetType().Name.Replace("Syntax", "");
        sb.Append($"{kind} {Span(source, s.Span)}{(head.Length > 0 ? " " + head : "")}\n");
        switch (s)
        {
            case DefinitionSyntax d:
                sb.Append($"  value {Expr(source, d.Value)}\n");
                break;
            case FunctionSyntax f:
                foreach (var p in f.Parameters)
                    sb.Append($"  parameter {p.Name}: {p.KindName}{(p.Default is null ? "" : " = " + Expr(source, p.Default))}\n");
                sb.Append($"  body {Expr(source, f.Body)}\n");
                break;
            case CheckSyntax c:
                sb.Append($"  condition {Expr(source, c.Condition)}\n");
                if (c.Tolerance is not null) sb.Append($"  within {Expr(source, c.Tolerance)}\n");
                break;
            case CautionSyntax c:
                sb.Append($"  when {Expr(source, c.Condition)}\n");
                break;
            case UseSyntax u:
                foreach (var o in u.Overrides) sb.Append($"  with {o.Name} = {Expr(source, o.Value)}\n");
                break;
        }
        Clauses(sb, source, s.Clauses);
    }

    private static void Clauses(StringBuilder sb, SourceText source, ClausesSyntax c)
    {
        if (c.Description is not null) sb.Append($"  description {Quote(c.Description.Value)}\n");
        if (c.Assumed is not null) sb.Append("  assumed\n");
        if (c.Source is not null) sb.Append($"  source {Quote(c.Source.Value)}\n");
        if (c.Accepted is not null) sb.Append($"  accepted {Quote(c.Accepted.Value)}\n");
        foreach (var l in c.Locals) sb.Append($"  where {l.Name} = {Expr(source, l.Value)}\n");
        foreach (var v in c.Valid) sb.Append($"  valid {Expr(source, v.Condition)}{(v.Message is null ? "" : " " + Quote(v.Message.Value))}\n");
        foreach (var r in c.Require) sb.Append($"  require {Expr(source, r.Condition)}{(r.Message is null ? "" : " " + Quote(r.Message.Value))}\n");
        foreach (var k in c.Cautions) sb.Append($"  {k.Level.ToString().ToLowerInvariant()} {Quote(k.Message.Value)} when {Expr(source, k.Condition)}\n");
        foreach (var r in c.Rows)
        {
            sb.Append($"  row {r.Key}:");
            foreach (var cell in r.Cells)
            {
                sb.Append($" {cell.Column} = {Expr(source, cell.Value)}");
                if (cell.Low is not null) sb.Append($" from {Expr(source, cell.Low)} to {Expr(source, cell.High!)}");
                if (!ReferenceEquals(cell, r.Cells[^1])) sb.Append(',');
            }
            if (r.Source is not null) sb.Append($" source {Quote(r.Source.Value)}");
            sb.Append('\n');
        }
        if (c.Keywords.Count > 0) sb.Append($"  clause keywords in order [{string.Join(", ", c.Keywords.Select(k => k.Keyword))}]\n");
    }

    public static string Expr(SourceText source, ExpressionSyntax e) => e switch
    {
        QuantityLiteralSyntax q => Literal(q),
        NameSyntax n => n.FullName,
        BinarySyntax b => $"({Operator(b.Operator)} {Expr(source, b.Left)} {Expr(source, b.Right)})",
        UnarySyntax u => $"({u.Operator switch { UnaryOperator.Negate => "neg", UnaryOperator.Plus => "pos", _ => "not" }} {Expr(source, u.Operand)})",
        ConvertSyntax c => $"(as {Expr(source, c.Operand)} {c.Unit.Text})",
        CallSyntax c => $"(call {c.Callee.FullName}{string.Concat(c.Arguments.Select(a => " " + (a.Name is null ? Expr(source, a.Value) : $"({a.Name}: {Expr(source, a.Value)})")))})",
        ConditionalSyntax c => $"(if {Expr(source, c.Condition)} {Expr(source, c.Then)} {Expr(source, c.Else)})",
        ListSyntax l => $"(list{string.Concat(l.Items.Select(i => " " + Expr(source, i)))})",
        LookupSyntax l => $"(lookup {l.Table.FullName} {Expr(source, l.Key)} {l.Column})",
        BooleanLiteralSyntax b => b.Value ? "true" : "false",
        ErrorExpressionSyntax x => $"(error {Quote(source.Slice(x.Span))})",
        _ => $"(? {e.GetType().Name})",
    };

    private static string Literal(QuantityLiteralSyntax q)
    {
        string value = q.Number.ToString("R", CultureInfo.InvariantCulture);
        string number = q.NumberText + (value == q.NumberText ? "" : "=" + value) + (q.IsFraction ? " fraction" : "");
        return q.Unit is null ? $"(num {number})" : $"(qty {number} {q.Unit.Text})";
    }

    private static string Operator(BinaryOperator op) => op switch
    {
        BinaryOperator.Add => "+", BinaryOperator.Subtract => "-", BinaryOperator.Multiply => "*", BinaryOperator.Divide => "/",
        BinaryOperator.Power => "^", BinaryOperator.Equal => "==", BinaryOperator.NotEqual => "!=", BinaryOperator.Less => "<",
        BinaryOperator.LessEqual => "<=", BinaryOperator.Greater => ">", BinaryOperator.GreaterEqual => ">=",
        BinaryOperator.And => "and", _ => "or",
    };

    private static void Diagnostic(StringBuilder sb, SourceText source, Diagnostic d)
    {
        sb.Append($"  {d.Code} {d.Severity.ToString().ToLowerInvariant()} {Span(source, d.Span)} {d.Message}\n");
        foreach (var f in d.Fixes)
            sb.Append($"    fix {Quote(f.Title)}: {string.Join("; ", f.Edits.Select(e => $"{Span(source, e.Span)} → {Quote(e.NewText)}"))}\n");
    }

    private static string Span(SourceText source, TextSpan span) => $"{source.GetPosition(span.Start)}-{source.GetPosition(span.End)}";

    /// <summary>
    /// Text in double quotes: quotes and backslashes escaped, a line break as \n, other control
    /// characters and lone surrogates as \uXXXX, everything else (µ, °, an emoji) as it is.
    /// </summary>
    private static string Quote(string text)
    {
        if (text.Length > 120) text = text[..120] + "…";
        var sb = new StringBuilder("\"");
        for (int i = 0; i < text.Length; i++)
        {
            char c = text[i];
            bool pair = char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]);
            if (pair) { sb.Append(c).Append(text[++i]); continue; }
            if (c is '"' or '\\') sb.Append('\\').Append(c);
            else if (c == '\n') sb.Append("\\n");
            else if (c == '\r') sb.Append("\\r");
            else if (char.IsControl(c) || char.IsSurrogate(c)) sb.Append("\\u").Append(((int)c).ToString("X4", CultureInfo.InvariantCulture));
            else sb.Append(c);
        }
        return sb.Append('"').ToString();
    }
}
