namespace CutSheet.Cli.Rendering;

/// <summary>Lays out <see cref="ListingLine"/>s as aligned text.</summary>
internal static class ListingLayout
{
    /// <summary>The number of leading columns that are aligned across all row groups.</summary>
    private const int SharedColumns = 2;

    private const string Gap = "  ";

    public static void Write(TextWriter output, IReadOnlyList<ListingLine> lines, Painter painter)
    {
        var rows = lines.OfType<ListingLine.Row>().ToList();
        var widths = new Dictionary<string, int[]>(StringComparer.Ordinal);
        foreach (var group in rows.GroupBy(r => r.Group))
        {
            int columns = group.Max(r => r.Cells.Count);
            var w = new int[columns];
            foreach (var row in group)
            {
                for (int i = 0; i < row.Cells.Count; i++) w[i] = Math.Max(w[i], DisplayWidth.Of(row.Cells[i].Text));
            }
            widths[group.Key] = w;
        }
        for (int i = 0; i < SharedColumns; i++)
        {
            int shared = widths.Values.Where(w => w.Length > i).Select(w => w[i]).DefaultIfEmpty(0).Max();
            foreach (var w in widths.Values) if (w.Length > i) w[i] = shared;
        }

        bool first = true;
        foreach (var line in lines)
        {
            switch (line)
            {
                case ListingLine.Heading heading:
                    if (!first) output.WriteLine();
                    output.WriteLine(painter.Paint(new string('#', Math.Max(1, heading.Level)) + " " + heading.Text, Tone.Strong));
                    break;
                case ListingLine.Row row:
                    output.WriteLine(Format(row, widths[row.Group], painter));
                    break;
            }
            first = false;
        }
    }

    private static string Format(ListingLine.Row row, int[] widths, Painter painter)
    {
        // Trailing empty cells would leave trailing spaces; the last written cell is not padded on the right.
        int last = row.Cells.Count - 1;
        while (last > SharedColumns - 1 && row.Cells[last].Text.Length == 0) last--;
        var parts = new List<string>(last + 1);
        for (int i = 0; i <= last; i++)
        {
            var cell = row.Cells[i];
            // Colour only the text, not the padding, so that the styles never run into the gap.
            string pad = new(' ', Math.Max(0, widths[i] - DisplayWidth.Of(cell.Text)));
            string painted = painter.Paint(cell.Text, cell.Tone);
            string text = cell.AlignRight ? pad + painted : i == last ? painted : painted + pad;
            parts.Add(text);
        }
        return string.Join(Gap, parts).TrimEnd();
    }
}
