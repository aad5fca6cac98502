using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// The table itself, drawn the way section 14 tables usually look (common practice): horizontal
/// rules only (above the column headers, below them, and below the last row), a short rule under
/// each spanning header, no vertical lines, no shading. Header rows repeat on every page
/// (w:tblHeader) and no row splits across a page break (w:cantSplit).
/// </summary>
public sealed class WordTableBuilder
{
    /// <summary>Label indentation per level: 0.15 inch (common practice).</summary>
    public const int IndentTwips = 216;

    /// <summary>Extra indentation levels of the second and later lines of a wrapped label.</summary>
    public const int ContinuationLevels = 2;

    /// <summary>Left and right cell padding: 0.06 inch.</summary>
    public const int CellMarginTwips = 86;

    /// <summary>Padding between a rule and the text next to it: 2 pt.</summary>
    private const int RulePaddingTwips = 40;

    /// <summary>
    /// Padding above every cell's text: 1 pt, so that the first row on a continuation page does
    /// not touch the rule under the repeated header.
    /// </summary>
    private const int BodyPaddingTwips = 20;

    /// <summary>Rule thickness in eighths of a point: 0.75 pt.</summary>
    private const uint RuleSize = 6;

    private readonly TableDocument _document;
    private readonly int[] _widths;

    public WordTableBuilder(TableDocument document, int textWidthTwips, WordFontMetrics font)
    {
        _document = document;
        _widths = WordColumnWidths.Compute(document, textWidthTwips, font, IndentTwips, CellMarginTwips);
    }

    public Table Build()
    {
        var table = new Table(TableProperties(), Grid());
        int headerCount = _document.HeaderRows.Count;
        for (int h = 0; h < headerCount; h++)
            table.AppendChild(HeaderRow(_document.HeaderRows[h], isFirst: h == 0, isLast: h == headerCount - 1));
        var keepWithNext = WordBlockKeeping.KeepWithNext(_document.Rows);
        for (int r = 0; r < _document.Rows.Count; r++)
        {
            table.AppendChild(BodyRow(_document.Rows[r], isFirst: r == 0, ruleAbove: r == 0 && headerCount == 0, ruleBelow: r == _document.Rows.Count - 1,
                keepWithNext[r]));
        }
        if (_document.Rows.Count == 0)
            table.AppendChild(EmptyClosingRow(ruleAbove: headerCount == 0));
        return table;
    }

    private TableProperties TableProperties() => new(
        new TableWidth { Width = Twips(_widths.Sum()), Type = TableWidthUnitValues.Dxa },
        new TableIndentation { Width = 0, Type = TableWidthUnitValues.Dxa },
        // Rules are drawn on the cells, not the table, so that a repeated header row carries its
        // rules onto every page.
        new TableBorders(
            new TopBorder { Val = BorderValues.Nil },
            new LeftBorder { Val = BorderValues.Nil },
            new BottomBorder { Val = BorderValues.Nil },
            new RightBorder { Val = BorderValues.Nil },
            new InsideHorizontalBorder { Val = BorderValues.Nil },
            new InsideVerticalBorder { Val = BorderValues.Nil }),
        new TableLayout { Type = TableLayoutValues.Fixed },
        new TableCellMarginDefault(
            new TopMargin { Width = Twips(BodyPaddingTwips), Type = TableWidthUnitValues.Dxa },
            new TableCellLeftMargin { Width = CellMarginTwips, Type = TableWidthValues.Dxa },
            new TableCellRightMargin { Width = CellMarginTwips, Type = TableWidthValues.Dxa }),
        new TableLook { Val = "0000", FirstRow = false, LastRow = false, FirstColumn = false, LastColumn = false, NoHorizontalBand = true, NoVerticalBand = true });

    private TableGrid Grid()
    {
        var grid = new TableGrid();
        foreach (var width in _widths)
            grid.AppendChild(new GridColumn { Width = Twips(width) });
        return grid;
    }

    private TableRow HeaderRow(HeaderRow header, bool isFirst, bool isLast)
    {
        var row = new TableRow(new TableRowProperties(new CantSplit(), new TableHeader()));
        foreach (var placed in PlacedHeaderCell.Place(header))
        {
            bool spanRule = !isLast && placed.Cell.Span > 1 && placed.Cell.Text.Trim().Length > 0;
            var alignment = placed.FirstColumn == 0 && placed.Cell.Span == 1
                ? _document.Columns[0].Alignment
                : CellAlignment.Center;
            var paragraph = WordText.Paragraph(placed.Cell.Text, new ParagraphProperties(Justify(alignment)));
            row.AppendChild(Cell(placed.FirstColumn, placed.Cell.Span, paragraph,
                ruleAbove: isFirst, ruleBelow: isLast || spanRule, padAbove: isFirst, TableVerticalAlignmentValues.Bottom));
        }
        return row;
    }

    private TableRow BodyRow(BodyRow body, bool isFirst, bool ruleAbove, bool ruleBelow, bool keepWithNext)
    {
        var row = new TableRow(new TableRowProperties(new CantSplit()));
        // A wrapped label continues two levels deeper than its first line (hanging indent): one
        // level deeper would put the continuation where the rows it introduces start.
        var labelProperties = new ParagraphProperties();
        // A section label stays on the page of the first row it introduces, a short block stays whole (WordBlockKeeping).
        if (keepWithNext)
            labelProperties.AppendChild(new KeepNext());
        labelProperties.Append(
            new Indentation
            {
                Left = Twips((body.Indent + ContinuationLevels) * IndentTwips),
                Hanging = Twips(ContinuationLevels * IndentTwips),
            },
            Justify(_document.Columns[0].Alignment));
        row.AppendChild(Cell(0, 1, WordText.Paragraph(body.Label, labelProperties), ruleAbove, ruleBelow, padAbove: isFirst, TableVerticalAlignmentValues.Top));
        for (int c = 0; c < body.Cells.Count; c++)
        {
            var paragraph = WordText.Paragraph(body.Cells[c].Display, new ParagraphProperties(Justify(_document.Columns[c + 1].Alignment)));
            row.AppendChild(Cell(c + 1, 1, paragraph, ruleAbove, ruleBelow, padAbove: isFirst, TableVerticalAlignmentValues.Top));
        }
        return row;
    }

    /// <summary>A table without body rows still needs its closing rule.</summary>
    private TableRow EmptyClosingRow(bool ruleAbove)
    {
        var row = new TableRow(new TableRowProperties(new CantSplit()));
        row.AppendChild(Cell(0, _widths.Length, new Paragraph(), ruleAbove, ruleBelow: true, padAbove: true, TableVerticalAlignmentValues.Top));
        return row;
    }

    private TableCell Cell(int firstColumn, int span, Paragraph paragraph, bool ruleAbove, bool ruleBelow, bool padAbove, TableVerticalAlignmentValues vertical)
    {
        int width = 0;
        for (int c = firstColumn; c < firstColumn + span; c++)
            width += _widths[c];
        var properties = new TableCellProperties(
            new TableCellWidth { Width = Twips(width), Type = TableWidthUnitValues.Dxa });
        if (span > 1)
            properties.AppendChild(new GridSpan { Val = span });
        if (ruleAbove || ruleBelow)
        {
            var borders = new TableCellBorders();
            if (ruleAbove)
                borders.AppendChild(new TopBorder { Val = BorderValues.Single, Size = RuleSize, Space = 0, Color = "000000" });
            if (ruleBelow)
                borders.AppendChild(new BottomBorder { Val = BorderValues.Single, Size = RuleSize, Space = 0, Color = "000000" });
            properties.AppendChild(borders);
        }
        // Text never touches a rule: the rows next to one get a little padding on that side.
        if (padAbove || ruleBelow)
        {
            properties.AppendChild(new TableCellMargin(
                new TopMargin { Width = Twips(padAbove ? RulePaddingTwips : BodyPaddingTwips), Type = TableWidthUnitValues.Dxa },
                new BottomMargin { Width = Twips(ruleBelow ? RulePaddingTwips : 0), Type = TableWidthUnitValues.Dxa }));
        }
        properties.AppendChild(new TableCellVerticalAlignment { Val = vertical });
        return new TableCell(properties, paragraph);
    }

    private static string Twips(int value) => value.ToString(System.Globalization.CultureInfo.InvariantCulture);

    private static Justification Justify(CellAlignment alignment) => new()
    {
        Val = alignment switch
        {
            CellAlignment.Center => JustificationValues.Center,
            CellAlignment.Right => JustificationValues.Right,
            _ => JustificationValues.Left,
        },
    };
}
