namespace OutputForge.Layout;

/// <summary>
/// One display-ready table: every text is already formatted, so that each renderer (Word, Excel,
/// text) draws the same thing and none of them makes a rounding or wording decision.
/// </summary>
/// <param name="TableId">The table number as printed, e.g. "14.2.1".</param>
/// <param name="Titles">Title lines under "Table {TableId}".</param>
/// <param name="Population">The analysis population line, e.g. "Intent-to-Treat Population".</param>
/// <param name="StudyLine">The study identification printed in the page header.</param>
/// <param name="Columns">All columns, the first being the row-label column.</param>
/// <param name="HeaderRows">Column header rows, top to bottom; cells may span several columns.</param>
/// <param name="Rows">Body rows in display order.</param>
/// <param name="Footnotes">Method footnotes, warnings, then the spec's own footnotes, in print order.</param>
/// <param name="SourceLine">Provenance printed at the bottom: spec file, data files, run time, tool version.</param>
/// <param name="Page">Paper and font settings.</param>
public sealed record TableDocument(
    string TableId,
    IReadOnlyList<string> Titles,
    string Population,
    string StudyLine,
    IReadOnlyList<LayoutColumn> Columns,
    IReadOnlyList<HeaderRow> HeaderRows,
    IReadOnlyList<BodyRow> Rows,
    IReadOnlyList<string> Footnotes,
    string SourceLine,
    PageSettings Page)
{
    /// <summary>The heading line printed above the titles.</summary>
    public string Heading => $"Table {TableId}";

    /// <summary>The title block as printed, top to bottom; by default the heading, the titles and the population.</summary>
    public IReadOnlyList<string> TitleLines
    {
        get => _titleLines ?? [Heading, .. Titles, Population];
        init => _titleLines = value;
    }

    /// <summary>The line naming the table at the top of its second and later pages.</summary>
    public string ContinuedLine
    {
        get => _continuedLine ?? $"{Heading} (continued)";
        init => _continuedLine = value;
    }

    /// <summary>The page footer's lines; by default the source line.</summary>
    public IReadOnlyList<string> FooterLines
    {
        get => _footerLines ?? [SourceLine];
        init => _footerLines = value;
    }

    /// <summary>A picture drawn from the table's numbers, shown after the table and its footnotes; null when there is none.</summary>
    public Results.TableFigure? Figure { get; init; }

    private readonly IReadOnlyList<string>? _titleLines;
    private readonly string? _continuedLine;
    private readonly IReadOnlyList<string>? _footerLines;
}

/// <summary>A column of the table body.</summary>
/// <param name="Key">Stable key (e.g. the arm's key, or "label"); used by renderers for widths only.</param>
/// <param name="Alignment">How cell text is aligned.</param>
public sealed record LayoutColumn(string Key, CellAlignment Alignment);

public enum CellAlignment { Left, Center, Right }

/// <summary>One row of column headers.</summary>
public sealed record HeaderRow(IReadOnlyList<HeaderCell> Cells);

/// <summary>A header cell covering <paramref name="Span"/> consecutive columns.</summary>
public sealed record HeaderCell(string Text, int Span = 1);

public enum RowKind
{
    /// <summary>A row of numbers.</summary>
    Data,
    /// <summary>A grouping label (e.g. a statistic block or a system organ class) that may also carry numbers.</summary>
    Section,
    /// <summary>An empty spacer row between blocks.</summary>
    Blank,
}

/// <summary>A body row: a label (with an indentation level) and one cell per non-label column.</summary>
public sealed record BodyRow(string Label, int Indent, IReadOnlyList<LayoutCell> Cells, RowKind Kind = RowKind.Data)
{
    public static BodyRow Blank(int cellCount) =>
        new(string.Empty, 0, Enumerable.Repeat(LayoutCell.Empty, cellCount).ToArray(), RowKind.Blank);
}

/// <summary>
/// A formatted cell. <paramref name="Number"/> is set only when the cell shows exactly one number,
/// so that the spreadsheet can store it as a numeric cell with <paramref name="ExcelFormat"/>
/// (e.g. "0", "0.0", "0.000") and still display <paramref name="Text"/>.
/// </summary>
public sealed record LayoutCell(string Text, double? Number = null, string? ExcelFormat = null)
{
    public static readonly LayoutCell Empty = new(string.Empty);

    /// <summary>
    /// <see cref="Text"/> padded with no-break spaces so that it lines up with the other cells of
    /// its column (see <see cref="NumberAlignment"/>); null when the cell needs no padding.
    /// </summary>
    public string? Aligned { get; init; }

    /// <summary>The text a paged renderer draws: the aligned text when there is one.</summary>
    public string Display => Aligned ?? Text;
}

public enum PaperSize { Letter, A4 }

public enum PageOrientation { Landscape, Portrait }

/// <summary>Page setup shared by the paged renderers.</summary>
public sealed record PageSettings(
    PaperSize Paper = PaperSize.Letter,
    PageOrientation Orientation = PageOrientation.Landscape,
    string FontName = "Courier New",
    double FontSizePoints = 9,
    double MarginInches = 1.0)
{
    public static readonly PageSettings Default = new();
}
