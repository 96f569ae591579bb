using CutSheet.Editing.Highlighting;

namespace CutSheet.LanguageServer.Conversion;

/// <summary>
/// The semantic token legend: each highlight category maps to a standard token type so that
/// any theme colours it. Units take <c>type</c> and names <c>variable</c>, so units stand apart
/// from names in every theme.
/// </summary>
public static class SemanticLegend
{
    public static readonly string[] TokenTypes =
        ["keyword", "number", "type", "string", "comment", "operator", "variable", "function", "parameter", "enum", "enumMember", "struct", "class", "namespace"];

    public static readonly string[] TokenModifiers = ["declaration", "defaultLibrary", "readonly", "documentation"];

    public static int TypeOf(HighlightCategory category) => category switch
    {
        HighlightCategory.Keyword => 0,
        HighlightCategory.Number => 1,
        HighlightCategory.Unit => 2,
        HighlightCategory.String => 3,
        HighlightCategory.Comment or HighlightCategory.Heading => 4,
        HighlightCategory.Operator => 5,
        HighlightCategory.Function => 7,
        HighlightCategory.Parameter => 8,
        HighlightCategory.Choice => 9,
        HighlightCategory.Option => 10,
        HighlightCategory.Table => 11,
        HighlightCategory.Kind => 12,
        HighlightCategory.Namespace => 13,
        _ => 6,
    };

    public static int ModifiersOf(HighlightSpan span)
    {
        int bits = 0;
        if (span.Modifiers.HasFlag(HighlightModifiers.Declaration)) bits |= 1;
        if (span.Modifiers.HasFlag(HighlightModifiers.Builtin)) bits |= 2;
        if (span.Modifiers.HasFlag(HighlightModifiers.Library) || span.Category == HighlightCategory.Constant) bits |= 4;
        if (span.Category == HighlightCategory.Heading) bits |= 8;
        return bits;
    }
}
