using System.Text;
using OutputForge.Layout;

namespace OutputForge.Rendering.Text;

/// <summary>
/// A monospaced preview of a table for a terminal or a code review: the same rules, column order,
/// spanning headers and indentation as the Word table, with "\n" line endings and no trailing
/// blanks so that two runs differ only where the table differs.
/// </summary>
public sealed class TextTableRenderer : ITableRenderer
{
    /// <summary>Characters between two columns.</summary>
    public const int ColumnGap = 2;

    /// <summary>Characters of indentation per label level.</summary>
    public const int IndentWidth = 2;

    public string Extension => ".txt";

    public void Write(TableDocument document, Stream output)
    {
        var text = Render(document);
        var bytes = new UTF8Encoding(encoderShouldEmitUTF8Identifier: false).GetBytes(text);
        output.Write(bytes, 0, bytes.Length);
    }

    /// <summary>The whole preview as one string.</summary>
    public string Render(TableDocument document)
    {
        TableShape.Check(document);
        int[] widths = TextColumnWidths.Compute(document, IndentWidth, ColumnGap);
        int[] starts = ColumnStarts(widths);
        int tableWidth = TextColumnWidths.RegionWidth(widths, 0, widths.Length - 1, ColumnGap);

        var lines = new List<string> { document.StudyLine, string.Empty };
        foreach (var title in document.TitleLines)
            lines.AddRange(CellLines.Split(title).Select(t => Centered(t, tableWidth)));
        lines.Add(string.Empty);

        string rule = new('-', tableWidth);
        lines.Add(rule);
        for (int h = 0; h < document.HeaderRows.Count; h++)
        {
            bool isLastHeaderRow = h == document.HeaderRows.Count - 1;
            lines.AddRange(HeaderLines(document, document.HeaderRows[h], widths, starts, underlineSpans: !isLastHeaderRow));
        }
        if (document.HeaderRows.Count > 0)
            lines.Add(rule);

        foreach (var row in document.Rows)
            lines.AddRange(BodyLines(document, row, widths, starts));
        lines.Add(rule);

        lines.AddRange(document.Footnotes.SelectMany(CellLines.Split));
        lines.AddRange(document.FooterLines.SelectMany(CellLines.Split));

        var builder = new StringBuilder();
        foreach (var line in lines)
            builder.Append(line.TrimEnd()).Append('\n');
        return builder.ToString();
    }

    private static int[] ColumnStarts(int[] widths)
    {
        var starts = new int[widths.Length];
        for (int c = 1; c < widths.Length; c++)
            starts[c] = starts[c - 1] + widths[c - 1] + ColumnGap;
        return starts;
    }

    private static string Centered(string text, int width)
    {
        var line = new TextLine(Math.Max(width, text.Length));
        line.Place(text, 0, Math.Max(width, text.Length), CellAlignment.Center);
        return line.ToString();
    }

    /// <summary>
    /// Header texts sit on the bottom line of their row, as in the Word table; a spanning header
    /// that is not in the last header row is underlined across the columns it covers.
    /// </summary>
    private static IEnumerable<string> HeaderLines(
        TableDocument document, HeaderRow row, int[] widths, int[] starts, bool underlineSpans)
    {
        var placed = PlacedHeaderCell.Place(row);
        int tableWidth = starts[^1] + widths[^1];
        int height = placed.Max(p => CellLines.Split(p.Cell.Text).Length);
        var lines = Enumerable.Range(0, height).Select(_ => new TextLine(tableWidth)).ToArray();
        foreach (var p in placed)
        {
            var cellLines = CellLines.Split(p.Cell.Text);
            int width = TextColumnWidths.RegionWidth(widths, p.FirstColumn, p.LastColumn, ColumnGap);
            var alignment = p.FirstColumn == 0 && p.Cell.Span == 1 ? document.Columns[0].Alignment : CellAlignment.Center;
            for (int i = 0; i < cellLines.Length; i++)
                lines[height - cellLines.Length + i].Place(cellLines[i], starts[p.FirstColumn], width, alignment);
        }
        foreach (var line in lines)
            yield return line.ToString();

        var spanning = placed.Where(p => p.Cell.Span > 1 && p.Cell.Text.Trim().Length > 0).ToList();
        if (!underlineSpans || spanning.Count == 0)
            yield break;
        var underline = new TextLine(tableWidth);
        foreach (var p in spanning)
            underline.Fill('-', starts[p.FirstColumn], TextColumnWidths.RegionWidth(widths, p.FirstColumn, p.LastColumn, ColumnGap));
        yield return underline.ToString();
    }

    private static IEnumerable<string> BodyLines(TableDocument document, BodyRow row, int[] widths, int[] starts)
    {
        if (row.Kind == RowKind.Blank)
        {
            yield return string.Empty;
            yield break;
        }
        int tableWidth = starts[^1] + widths[^1];
        var labelLines = CellLines.Split(row.Label);
        var cellLines = row.Cells.Select(c => CellLines.Split(c.Display.Replace(NumberAlignment.Pad, ' '))).ToArray();
        int height = Math.Max(labelLines.Length, cellLines.Select(l => l.Length).DefaultIfEmpty(1).Max());
        int indent = row.Indent * IndentWidth;
        for (int i = 0; i < height; i++)
        {
            var line = new TextLine(tableWidth);
            if (i < labelLines.Length)
                line.Place(labelLines[i], indent, widths[0] - indent, document.Columns[0].Alignment);
            for (int c = 0; c < cellLines.Length; c++)
            {
                if (i < cellLines[c].Length)
                    line.Place(cellLines[c][i], starts[c + 1], widths[c + 1], document.Columns[c + 1].Alignment);
            }
            yield return line.ToString();
        }
    }
}
