using CutSheet.Editing.Analysis;
using CutSheet.Language.Results;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Outline;

/// <summary>
/// The sheet's outline and folds. A heading opens a section that runs to the next heading of
/// the same or a higher level (<c>#</c> holds <c>##</c>), so sections nest as the sheet reads.
/// </summary>
public static class OutlineProvider
{
    public static IReadOnlyList<OutlineItem> Outline(SheetAnalysis analysis)
    {
        var root = new List<OutlineItem>();
        var open = new Stack<(int Level, HeadingSyntax Heading, List<OutlineItem> Children)>();
        var statements = analysis.Result.Statements;
        int lastEnd = 0;

        void Close(int level)
        {
            while (open.Count > 0 && open.Peek().Level >= level)
            {
                var (_, heading, children) = open.Pop();
                var item = new OutlineItem(heading.Text, null, OutlineCategory.Section,
                    TextSpan.FromBounds(heading.Span.Start, Math.Max(heading.Span.End, lastEnd)), heading.Span, children);
                (open.Count > 0 ? open.Peek().Children : root).Add(item);
            }
        }

        foreach (var statement in statements)
        {
            if (statement.Syntax is HeadingSyntax h)
            {
                Close(h.Level);
                open.Push((h.Level, h, []));
                lastEnd = h.Span.End;
                continue;
            }
            var item = Item(analysis, statement);
            if (item is null) continue;
            (open.Count > 0 ? open.Peek().Children : root).Add(item);
            lastEnd = statement.Span.End;
        }
        Close(int.MinValue);
        return root;
    }

    public static IReadOnlyList<FoldRange> Folds(SheetAnalysis analysis)
    {
        var source = analysis.Source;
        var folds = new List<FoldRange>();
        var headings = analysis.Result.Syntax.Statements.OfType<HeadingSyntax>().ToList();
        for (int i = 0; i < headings.Count; i++)
        {
            int start = source.GetPosition(headings[i].Span.Start).Line;
            var next = headings.Skip(i + 1).FirstOrDefault(h => h.Level <= headings[i].Level);
            int end = (next is null ? source.LineCount : source.GetPosition(next.Span.Start).Line) - 1;
            while (end > start && source.LineText(end).Trim().Length == 0) end--;
            if (end > start) folds.Add(new FoldRange(start, end, IsSection: true));
        }
        foreach (var statement in analysis.Result.Syntax.Statements.Where(s => s is not HeadingSyntax))
        {
            int start = source.GetPosition(statement.Span.Start).Line, end = source.GetPosition(statement.Span.End).Line;
            if (end > start) folds.Add(new FoldRange(start, end, IsSection: false));
        }
        return folds.OrderBy(f => f.StartLine).ToList();
    }

    private static OutlineItem? Item(SheetAnalysis analysis, StatementResult statement) => statement switch
    {
        DefinitionResult d => new OutlineItem(d.Name, d.Value?.Text, OutlineCategory.Definition, d.Span, d.Definition.NameSpan, []),
        CheckResult c => new OutlineItem("check " + analysis.Source.Slice(c.Check.Condition.Span), Hints.ValueHintProvider.CheckLabel(c), OutlineCategory.Check, c.Span, c.Check.Condition.Span, []),
        _ => statement.Syntax switch
        {
            FunctionSyntax f => new OutlineItem(f.Name, Signatures.SignatureText.Of(f, analysis.Source), OutlineCategory.Function, f.Span, f.NameSpan, []),
            ChoiceSyntax c => new OutlineItem(c.Name, string.Join(" | ", c.Options.Select(o => o.Name)), OutlineCategory.Choice, c.Span, c.NameSpan, []),
            TableSyntax t => new OutlineItem(t.Name, "table", OutlineCategory.Table, t.Span, t.NameSpan, []),
            KindDeclarationSyntax k => new OutlineItem(k.Name, "kind of " + k.Base, OutlineCategory.Kind, k.Span, k.NameSpan, []),
            UseSyntax u => new OutlineItem("use " + u.Target, u.Alias, OutlineCategory.Import, u.Span, u.TargetSpan, []),
            _ => null,
        },
    };
}
