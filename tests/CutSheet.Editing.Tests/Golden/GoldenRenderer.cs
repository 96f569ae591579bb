using System.Text;
using CutSheet.Editing.Analysis;
using CutSheet.Editing.Completion;
using CutSheet.Editing.Fixes;
using CutSheet.Editing.Formatting;
using CutSheet.Editing.Highlighting;
using CutSheet.Editing.Hints;
using CutSheet.Editing.Hover;
using CutSheet.Editing.Navigation;
using CutSheet.Editing.Outline;
using CutSheet.Editing.Signatures;
using CutSheet.Language.Text;

namespace CutSheet.Editing.Tests.Golden;

/// <summary>Runs one editing feature on a case and writes what it returns as plain text, positions as LINE:COLUMN from 1.</summary>
public static class GoldenRenderer
{
    public static string Render(GoldenCase c)
    {
        var analysis = SheetAnalysis.Evaluate(c.Text, "/work/sheet.cutsheet", 1);
        int cursor = c.Cursor ?? 0;
        return c.Feature switch
        {
            "hover" => Hover(analysis, cursor),
            "completion" => Completion(analysis, cursor),
            "definition" => Locations(analysis, NavigationProvider.Definition(analysis, cursor) is { } d ? [d] : []),
            "references" => Locations(analysis, NavigationProvider.References(analysis, [], cursor, includeDeclaration: true)),
            "rename" => Rename(analysis, cursor, c.Directives.GetValueOrDefault("rename", "renamed")),
            "symbols" => Symbols(analysis),
            "tokens" => Tokens(analysis),
            "fixes" => Fixes(analysis, c.Cursor),
            "format" => Format(analysis),
            "hints" => Hints(analysis, c.Directives.ContainsKey("inputs")),
            "signature" => Signature(analysis, cursor),
            "folding" => Folding(analysis),
            _ => throw new InvalidOperationException($"no feature named {c.Feature}"),
        };
    }

    private static string Pos(SourceText text, int offset)
    {
        var p = text.GetPosition(offset);
        return $"{p.Line + 1}:{p.Column + 1}";
    }

    private static string Span(SourceText text, TextSpan span) => $"{Pos(text, span.Start)}-{Pos(text, span.End)}";

    private static string Hover(SheetAnalysis a, int cursor) =>
        HoverProvider.Hover(a, cursor) is { } h ? $"span {Span(a.Source, h.Span)} '{a.Source.Slice(h.Span)}'\n{h.Markdown}\n" : "(no hover)\n";

    /// <summary>
    /// The list as the editor receives it (already filtered and ranked), its first 25 entries in
    /// sort order; a detail left to resolving is resolved here and marked so.
    /// </summary>
    private static string Completion(SheetAnalysis a, int cursor)
    {
        var result = CompletionProvider.Complete(a, cursor);
        var sb = new StringBuilder();
        if (result.Items.Count == 0) return "(no completions)\n";
        var replace = result.Items[0].Replace;
        string typed = a.Source.Slice(replace);
        sb.Append($"replace {Span(a.Source, replace)} '{typed}', {result.Items.Count} {(result.Items.Count == 1 ? "item" : "items")}{(result.IsIncomplete ? " (incomplete)" : "")}\n");
        var shown = result.Items
            .OrderBy(i => i.SortText ?? i.Label, StringComparer.Ordinal).ThenBy(i => i.Label, StringComparer.Ordinal)
            .Take(25);
        foreach (var i in shown)
        {
            string detail = i.Detail is not null ? " — " + i.Detail
                : i.Key is not null && CompletionResolver.Resolve(a, i.Key)?.Detail is { } resolved ? " — " + resolved + " (resolved)"
                : "";
            string also = i.AdditionalEdits is { Count: > 0 } edits
                ? string.Concat(edits.Select(e => $" + at {Span(a.Source, e.Span)} '{e.NewText.ReplaceLineEndings("⏎")}'"))
                : "";
            sb.Append($"{i.Label} [{i.Category}]{(i.InsertText != i.Label ? " inserts '" + i.InsertText + "'" : "")}{detail}{also}\n");
        }
        return sb.ToString();
    }

    private static string Locations(SheetAnalysis a, IEnumerable<SheetLocation> locations)
    {
        var sb = new StringBuilder();
        foreach (var l in locations)
        {
            var text = l.Text ?? (l.Path == a.Path ? a.Source : null);
            string where = l.Path == a.Path ? "this sheet" : l.Path ?? "?";
            sb.Append(text is null
                ? $"{where}\n"
                : $"{where} {Span(text, l.Span)}: {text.LineText(text.GetPosition(l.Span.Start).Line).Trim()}\n");
        }
        return sb.Length == 0 ? "(none)\n" : sb.ToString();
    }

    private static string Rename(SheetAnalysis a, int cursor, string newName)
    {
        var edits = RenameProvider.Rename(a, [], cursor, newName, out string? refusal);
        if (edits is null) return $"refused: {refusal}\n";
        var own = edits.Where(e => e.Path == a.Path).OrderByDescending(e => e.Span.Start);
        string text = a.Text;
        foreach (var e in own) text = text.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText);
        var sb = new StringBuilder($"{edits.Count} edits\n");
        foreach (var e in edits.Where(e => e.Path != a.Path)) sb.Append($"in {e.Path}: {e.NewText}\n");
        return sb.Append(text).Append('\n').ToString();
    }

    private static string Symbols(SheetAnalysis a)
    {
        var sb = new StringBuilder();
        void Write(OutlineItem item, int depth)
        {
            sb.Append(' ', depth * 2).Append($"{item.Category} '{item.Name}' {Span(a.Source, item.Span)}{(item.Detail is null ? "" : " — " + item.Detail)}\n");
            foreach (var child in item.Children) Write(child, depth + 1);
        }
        foreach (var item in OutlineProvider.Outline(a)) Write(item, 0);
        return sb.ToString();
    }

    private static string Tokens(SheetAnalysis a)
    {
        var sb = new StringBuilder();
        foreach (var t in HighlightProvider.Highlight(a))
            sb.Append($"{Pos(a.Source, t.Span.Start)} '{a.Source.Slice(t.Span)}' {t.Category}{(t.Modifiers == HighlightModifiers.None ? "" : " " + t.Modifiers)}\n");
        return sb.ToString();
    }

    private static string Fixes(SheetAnalysis a, int? cursor)
    {
        var range = cursor is { } c ? new TextSpan(c, 0) : new TextSpan(0, a.Text.Length);
        var sb = new StringBuilder();
        foreach (var offer in FixProvider.Fixes(a, range))
        {
            string text = a.Text;
            foreach (var e in offer.Fix.Edits.Where(e => e.Path is null).OrderByDescending(e => e.Span.Start))
                text = text.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText);
            sb.Append($"{offer.Diagnostic.Code} at {Span(a.Source, offer.Diagnostic.Span)}: {offer.Diagnostic.Message}\n");
            sb.Append($"fix: {offer.Fix.Title}\n{text}\n---\n");
        }
        return sb.Length == 0 ? "(no fixes)\n" : sb.ToString();
    }

    private static string Format(SheetAnalysis a)
    {
        var edits = SheetFormatter.Format(a);
        if (edits.Count == 0) return "(no edits)\n";
        string text = a.Text;
        foreach (var e in edits.OrderByDescending(e => e.Span.Start))
            text = text.Remove(e.Span.Start, e.Span.Length).Insert(e.Span.Start, e.NewText);
        return $"{edits.Count} edits\n{text}\n";
    }

    private static string Hints(SheetAnalysis a, bool inputs)
    {
        string text = a.Text;
        foreach (var h in ValueHintProvider.Hints(a, new HintOptions(true, inputs)).OrderByDescending(h => h.Offset))
            text = text.Insert(h.Offset, " ⟪" + h.Label + "⟫");
        var sb = new StringBuilder(text).Append("\n--- lenses\n");
        foreach (var l in ValueLensProvider.Lenses(a, new HintOptions(true, inputs)))
            sb.Append($"{Span(a.Source, l.Span)} {l.Title}\n");
        return sb.ToString();
    }

    private static string Signature(SheetAnalysis a, int cursor)
    {
        if (SignatureHelpProvider.Help(a, cursor) is not { } s) return "(no signature)\n";
        var sb = new StringBuilder($"{s.Label}\n");
        for (int i = 0; i < s.Parameters.Count; i++) sb.Append(i == s.ActiveParameter ? "> " : "  ").Append(s.Parameters[i]).Append('\n');
        if (s.Documentation is not null) sb.Append(s.Documentation).Append('\n');
        return sb.ToString();
    }

    private static string Folding(SheetAnalysis a) =>
        string.Concat(OutlineProvider.Folds(a).Select(f => $"lines {f.StartLine + 1}-{f.EndLine + 1}{(f.IsSection ? " section" : "")}\n"));
}
