using System.Text;
using CutSheet.Editing.Analysis;
using CutSheet.Editing.Symbols;
using CutSheet.Editing.Values;
using CutSheet.Language.Evaluation;
using CutSheet.Language.Results;
using CutSheet.Language.Semantics;
using CutSheet.Language.Syntax;
using CutSheet.Language.Syntax.Nodes;
using CutSheet.Language.Units;

namespace CutSheet.Editing.Hover;

/// <summary>
/// What the cursor is on, explained: a definition's value in both unit systems with its kind
/// and dimension, its formula as written and with the values put in, its description and
/// source; a function's signature, description, formula, validity and source; a unit's name;
/// a check's outcome.
/// </summary>
public static class HoverProvider
{
    public static HoverInfo? Hover(SheetAnalysis analysis, int offset)
    {
        if (analysis.Index.At(offset) is { } occurrence)
        {
            string? text = Describe(analysis, occurrence.Target);
            return text is null ? null : new HoverInfo(occurrence.Span, text);
        }
        var token = analysis.Result.Syntax.Tokens.FirstOrDefault(t => t.Span.Contains(offset));
        if (token.Kind == TokenKind.Unit)
        {
            string unitText = analysis.Source.Slice(token.Span);
            string? text = Unit(unitText);
            return text is null ? null : new HoverInfo(token.Span, text);
        }
        if (token.Kind == TokenKind.Check && analysis.Result.Checks.FirstOrDefault(c => c.Span.Contains(offset)) is { } check)
            return new HoverInfo(token.Span, Check(check, analysis.Source.Slice(check.Check.Condition.Span)));
        return null;
    }

    private static string? Describe(SheetAnalysis analysis, SymbolTarget target) => target.Symbol switch
    {
        DefinitionSymbol d when target.Path == analysis.Path
            && analysis.Result.Definitions.FirstOrDefault(r => r.Definition.NameSpan == d.Syntax.NameSpan) is { } own => OwnDefinition(analysis, own),
        DefinitionSymbol d => OtherDefinition(d, target, analysis.Result.Display.Digits),
        FunctionSymbol f => Function(f, target),
        ChoiceOption o => $"**{o.Name}**: an option of the choice `{o.Type.Name}`",
        ChoiceType c => $"**{c.Name}**: a choice of {string.Join(" | ", c.Options.Select(o => o.Name))}",
        TableSymbol t => $"**{t.Name}**: a table keyed by `{t.Key?.Name}`; columns {string.Join(", ", t.Columns.Select(c => $"`{c}`"))}",
        Kind k => Kind(k),
        _ => target.Category switch
        {
            SymbolCategory.BuiltinFunction => BuiltinFunction(target.Name),
            SymbolCategory.BuiltinConstant => Constant(target.Name),
            SymbolCategory.BuiltinKind => Kinds.Find(target.Name) is { } k ? Kind(k) : null,
            SymbolCategory.Parameter => Parameter(target),
            SymbolCategory.Local => $"**{target.Name}**: a local value of the function (`where`)",
            SymbolCategory.Namespace => $"**{target.Name}**: the names of an imported sheet, written `{target.Name}.NAME`",
            SymbolCategory.Sheet => Sheet(target),
            // A definition written twice: the second has no symbol of its own; the error says so.
            SymbolCategory.Definition => $"**{target.Name}**: defined again here; the first definition holds",
            _ => null,
        },
    };

    private static string OwnDefinition(SheetAnalysis analysis, DefinitionResult result)
    {
        var md = new StringBuilder();
        md.Append("**").Append(result.Name).Append("** = ")
            .Append(result.Value is null ? "unknown" : ValueText.Both(result.Value)).Append("\n\n");
        var facts = new List<string>();
        if (result.Kind is not null) facts.Add(result.Kind.Replace('_', ' '));
        if (result.Value is { } v && !double.IsNaN(v.Quantity.Si)) facts.Add("dimension " + v.Quantity.Dimension);
        facts.Add(result.IsInput ? "input" : "computed");
        if (result.IsAssumed) facts.Add("assumed");
        if (result.IsOverridden) facts.Add("overridden");
        md.Append(string.Join(" · ", facts)).Append("\n\n");
        string formula = analysis.Source.Slice(result.Definition.Value.Span);
        string substituted = FormulaSubstitution.Substitute(analysis, result.Definition.Value);
        md.Append("```cutsheet\n").Append(result.Name).Append(" = ").Append(formula).Append('\n');
        if (substituted != formula) md.Append(result.Name).Append(" = ").Append(substituted).Append('\n');
        md.Append("```\n");
        if (result.Description is not null) md.Append('\n').Append(result.Description).Append('\n');
        if (result.Source is not null) md.Append("\nsource: ").Append(result.Source).Append('\n');
        return md.ToString().TrimEnd();
    }

    private static string OtherDefinition(DefinitionSymbol d, SymbolTarget target, int digits)
    {
        var md = new StringBuilder();
        md.Append("**").Append(d.Name).Append("** = ").Append(ValueText.Of(d, digits) ?? "unknown");
        if (d.Value.Kind == ValueKind.Quantity && ValueText.OtherSystem(d.Value.Quantity, d.DisplayUnit?.Text ?? "", digits) is { } other
            && ValueText.Of(d, digits) is { } shown && !shown.EndsWith(other, StringComparison.Ordinal))
            md.Append(" (").Append(other).Append(')');
        md.Append("\n\n");
        if (d.Value.Kind == ValueKind.Quantity)
            md.Append(Kinds.Describe(d.Value.Quantity.Dimension, d.Value.Quantity.Tag)).Append(" · dimension ").Append(d.Value.Quantity.Dimension).Append(" · ");
        md.Append(d.IsInput ? "input" : "computed").Append("\n\n");
        if (target.HomeText is { } text)
            md.Append("```cutsheet\n").Append(d.Name).Append(" = ").Append(text.Slice(d.Syntax.Value.Span)).Append("\n```\n");
        if (d.Syntax.Clauses.Description is { } description) md.Append('\n').Append(description.Value).Append('\n');
        if (d.Syntax.Clauses.Source is { } source) md.Append("\nsource: ").Append(source.Value).Append('\n');
        md.Append("\nfrom ").Append(SheetLabel(d.Path)).Append('\n');
        return md.ToString().TrimEnd();
    }

    private static string Function(FunctionSymbol f, SymbolTarget target)
    {
        var md = new StringBuilder();
        md.Append("```cutsheet\n").Append(Signatures.SignatureText.Of(f.Syntax, target.HomeText)).Append("\n```\n");
        var clauses = f.Syntax.Clauses;
        if (clauses.Description is { } description) md.Append('\n').Append(description.Value).Append('\n');
        if (target.HomeText is { } text)
        {
            md.Append("\nformula: `").Append(text.Slice(f.Syntax.Body.Span)).Append("`\n");
            foreach (var c in clauses.Valid)
                md.Append("\nvalid for `").Append(text.Slice(c.Condition.Span)).Append('`').Append(c.Message is null ? "" : " — " + c.Message.Value).Append('\n');
            foreach (var c in clauses.Require)
                md.Append("\nrequires `").Append(text.Slice(c.Condition.Span)).Append('`').Append(c.Message is null ? "" : " — " + c.Message.Value).Append('\n');
        }
        if (clauses.Source is { } source) md.Append("\nsource: ").Append(source.Value).Append('\n');
        md.Append("\nfrom ").Append(SheetLabel(f.Home.Path)).Append('\n');
        return md.ToString().TrimEnd();
    }

    private static string? BuiltinFunction(string name) =>
        BuiltinCatalog.Functions.FirstOrDefault(f => f.Name == name) is { Name: not null } f
            ? $"```cutsheet\n{f.Signature}\n```\n\n{f.Description}\n\nbuilt in"
            : null;

    private static string? Constant(string name)
    {
        if (!BuiltinCatalog.Constants.TryGetValue(name, out var q)) return null;
        string value = q.Dimension.IsNone
            ? Language.Display.NumberFormatter.RoundTrip(q.Si)
            : Language.Display.NumberFormatter.RoundTrip(q.Si) + " " + Language.Display.DisplayUnits.SiUnit(q.Dimension).Text;
        string what = name == "g_n" ? "standard acceleration of gravity (exact)" : "the ratio of a circle's circumference to its diameter";
        return $"**{name}** = {value}\n\n{what} · built in";
    }

    private static string Kind(Kind k) =>
        $"**{k.Name}**: a kind of quantity — {k.Description}; dimension {k.Dimension}" + (k.Basis is null ? "" : $"; declared on {k.Basis.Name}");

    private static string? Parameter(SymbolTarget target)
    {
        if (target.HomeText is null) return $"**{target.Name}**: a parameter";
        var syntax = SheetSyntax.Parse(target.HomeText).Statements.OfType<FunctionSyntax>()
            .SelectMany(f => f.Parameters.Select(p => (f, p))).FirstOrDefault(x => x.p.NameSpan == target.Declaration);
        return syntax.p is null
            ? $"**{target.Name}**: a parameter"
            : $"**{syntax.p.Name}**: {syntax.p.KindName} — a parameter of `{syntax.f.Name}`" +
              (syntax.p.Default is null ? "" : $" (default `{target.HomeText.Slice(syntax.p.Default.Span)}`)");
    }

    private static string Sheet(SymbolTarget target)
    {
        string? library = LibraryPaths.NameOf(target.Path);
        string? text = library is not null ? Language.Library.LibrarySheets.Read(library) : null;
        string title = text is null ? "" : text.Split('\n').FirstOrDefault(l => l.StartsWith('#'))?.TrimStart('#', ' ').TrimEnd('\r') ?? "";
        return library is not null
            ? $"library sheet **{library}** (version {Language.Library.LibrarySheets.Version})" + (title.Length > 0 ? $"\n\n{title}" : "")
            : $"sheet `{target.Path}`";
    }

    private static string? Unit(string text)
    {
        var resolved = UnitCatalog.Default.Resolve(text);
        if (resolved.Unit is not { } unit) return null;
        var definition = UnitCatalog.Default.FindSymbol(text);
        var kind = unit.Tag ?? Kinds.Infer(unit.Dimension);
        string name = definition?.Name ?? text;
        string si = Language.Display.DisplayUnits.SiUnit(unit.Dimension).Text;
        string factor = unit.Factor == 1 && unit.Offset == 0 ? "" : $" = {Language.Display.NumberFormatter.Format(unit.Factor, 7)} {si}";
        return $"**{text}**: {name}{factor}\n\n{(kind is null ? "dimension " + unit.Dimension : kind.Name.Replace('_', ' ') + " · dimension " + unit.Dimension)}";
    }

    private static string Check(CheckResult check, string condition)
    {
        string status = check.Status switch
        {
            CheckStatus.Passed => "passed",
            CheckStatus.Failed => "**FAILED**",
            _ => "not evaluated",
        };
        var md = new StringBuilder($"check {status}: `{condition}`");
        if (check.Value is not null && check.Limit is not null)
            md.Append($"\n\n{check.Value.Primary} {check.Operator} {check.Limit.Primary}");
        if (check.Utilisation is { } u) md.Append($"\n\nutilisation {u * 100:0.#} %");
        if (check.Margin is not null) md.Append($" · margin {check.Margin.Primary}");
        if (check.Description is not null) md.Append("\n\n").Append(check.Description);
        return md.ToString();
    }

    private static string SheetLabel(string? path) =>
        LibraryPaths.NameOf(path) is { } name ? $"library sheet {name}" : path is null ? "this sheet" : "sheet " + System.IO.Path.GetFileName(path);
}
