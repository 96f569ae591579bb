namespace CutSheet.Cli.Rendering;

/// <summary>
/// A line of the results listing: a section heading, or a row of cells. Rows of one
/// <see cref="Group"/> share their column widths; the first two columns (line number and label)
/// are shared by every group so the listing reads as one table.
/// </summary>
internal abstract record ListingLine
{
    public sealed record Heading(int Level, string Text) : ListingLine;

    public sealed record Row(string Group, IReadOnlyList<Cell> Cells) : ListingLine;
}
