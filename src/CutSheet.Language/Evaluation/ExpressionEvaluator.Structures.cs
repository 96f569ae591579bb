using CutSheet.Language.Diagnostics;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax.Nodes;

namespace CutSheet.Language.Evaluation;

internal sealed partial class ExpressionEvaluator
{
    /// <summary><c>if … then … else …</c>: the branch not taken is still checked for dimensions.</summary>
    private Value Conditional(ConditionalSyntax c, EvalFrame f)
    {
        var condition = Evaluate(c.Condition, f);
        if (!condition.IsUnknown && condition.Kind != ValueKind.Boolean) return TypeError(f, c.Condition.Span, "true or false", condition);
        var checkFrame = new EvalFrame
        {
            Scope = f.Scope, Locals = f.Locals, Depth = f.Depth, CheckOnly = true, CallSite = f.CallSite, Foreign = f.Foreign,
            Function = f.Function, RecordDependencies = f.RecordDependencies,
        };
        bool known = !condition.IsUnknown;
        var a = Evaluate(c.Then, known && condition.Boolean ? f : checkFrame);
        var b = Evaluate(c.Else, known && !condition.Boolean ? f : checkFrame);
        if (checkFrame.DependsOnSheet) f.DependsOnSheet = true;
        if (a.Kind is ValueKind.Quantity or ValueKind.List && b.Kind is ValueKind.Quantity or ValueKind.List)
        {
            var (ad, _) = DimensionOf(a);
            var (bd, _) = DimensionOf(b);
            if (!ad.SiEquals(bd))
            {
                return Error(f, DiagnosticCodes.DimensionMismatch, c.Span,
                    DiagnosticMessages.DimensionMismatch("choose between", Label(c.Then, Sample(a), f), ad, Label(c.Else, Sample(b), f), bd));
            }
        }
        else if (!a.IsUnknown && !b.IsUnknown && a.Kind != b.Kind)
        {
            return TypeError(f, c.Else.Span, a.Describe(), b);
        }
        if (!known) return Value.Unknown;
        return condition.Boolean ? a : b;
    }

    private Value List(ListSyntax l, EvalFrame f)
    {
        if (l.Items.Count > QuantityList.MaxLength)
            return Error(f, DiagnosticCodes.LimitExceeded, l.Span, DiagnosticMessages.LimitExceeded($"a list holds at most {QuantityList.MaxLength} values"));
        if (l.Items.Count == 0) return Value.Of(new QuantityList([], Units.Dimension.None, null));
        var values = new double[l.Items.Count];
        Units.Dimension dim = default;
        Units.Kind? tag = null;
        bool unknown = false;
        for (int i = 0; i < values.Length; i++)
        {
            var v = Evaluate(l.Items[i], f);
            if (v.IsUnknown) { unknown = true; continue; }
            if (v.Kind != ValueKind.Quantity) return TypeError(f, l.Items[i].Span, "a quantity in a list", v);
            if (i == 0 || (unknown && dim.IsNone)) { dim = v.Quantity.Dimension; tag = v.Quantity.Tag; }
            else if (!v.Quantity.Dimension.SiEquals(dim))
            {
                return Error(f, DiagnosticCodes.DimensionMismatch, l.Items[i].Span,
                    DiagnosticMessages.DimensionMismatch("list together", Label(l.Items[0], new Quantity(values[0], dim, tag), f), dim, Label(l.Items[i], v.Quantity, f), v.Quantity.Dimension));
            }
            else if (tag is not null && v.Quantity.Tag is not null && tag != v.Quantity.Tag)
            {
                return Error(f, DiagnosticCodes.KindMismatch, l.Items[i].Span, DiagnosticMessages.KindMismatch("list together", tag.Name, v.Quantity.Tag.Name));
            }
            tag ??= v.Quantity.Tag;
            values[i] = v.Quantity.Si;
        }
        return unknown ? Value.Unknown : Value.Of(new QuantityList(values, dim, tag));
    }

    private Value Lookup(LookupSyntax l, EvalFrame f)
    {
        var symbol = l.Table.Qualifier is null ? f.Scope.Find(l.Table.Name) : ResolveName(l.Table, f, out _);
        var key = Evaluate(l.Key, f);
        if (symbol is not TableSymbol table)
        {
            return Error(f, DiagnosticCodes.UnknownName, l.Table.Span, DiagnosticMessages.UnknownName(l.Table.FullName,
                Suggest(l.Table.Name, f.Scope.Tables.Keys.Concat(f.Scope.Imported.Where(i => i.Value.Symbol is TableSymbol).Select(i => i.Key)))));
        }
        if (!table.Columns.Contains(l.Column))
            return Error(f, DiagnosticCodes.UnknownColumn, l.ColumnSpan, DiagnosticMessages.UnknownColumn(l.Column, table.Name));
        if (key.IsUnknown) return key;
        if (key.Kind != ValueKind.Choice || (table.Key is not null && key.Choice!.Type != table.Key))
            return TypeError(f, l.Key.Span, $"an option of {table.Key?.Name ?? "the table's choice"}", key);
        if (!table.Rows.TryGetValue(key.Choice!.Name, out var row) || !row.Cells.TryGetValue(l.Column, out var cell))
            return f.CheckOnly ? Value.Unknown : Error(f, DiagnosticCodes.MissingRow, l.Span, DiagnosticMessages.MissingRow(table.Name, key.Choice!.Name + "." + l.Column));
        return cell.Typical;
    }
}
