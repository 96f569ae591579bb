using CutSheet.Language.Text;

namespace CutSheet.Language.Syntax.Nodes;

/// <summary><c>row KEY: column = value [from LOW to HIGH], … [source "…"]</c>.</summary>
public sealed record TableRowSyntax(TextSpan Span, string Key, TextSpan KeySpan, IReadOnlyList<TableCellSyntax> Cells, TextValueSyntax? Source);
