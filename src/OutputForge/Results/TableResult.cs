namespace OutputForge.Results;

/// <summary>
/// Everything a table says, as data: its columns, rows and numbers, the notes that explain the
/// methods used, and the warnings raised while computing. Layout turns it into a display.
/// </summary>
public sealed record TableResult(
    string TableId,
    IReadOnlyList<string> Titles,
    string Population,
    IReadOnlyList<ResultColumn> Columns,
    IReadOnlyList<ResultRow> Rows,
    IReadOnlyList<string> MethodNotes,
    IReadOnlyList<string> Warnings,
    IReadOnlyList<string> Footnotes,
    TableProvenance Provenance,
    int PercentDecimals = 1,
    double PValueFloor = 0.001,
    PercentStyle? PercentStyle = null)
{
    /// <summary>A picture drawn from the table's numbers, shown after the table; null when the kind draws none.</summary>
    public TableFigure? Figure { get; init; }
}

/// <summary>
/// A result column. <paramref name="Key"/> is the stable key used in results.json (e.g. the arm
/// label in lower case with dashes: "placebo", "qf-217-10-mg", "total").
/// </summary>
public sealed record ResultColumn(string Key, string Label, int? SubjectCount);

public enum ResultRowKind { Data, Section, Blank }

/// <summary>
/// A result row. <paramref name="Key"/> is stable and readable (e.g. "responders",
/// "difference-ci"), so that a QC programmer can write it by hand.
/// </summary>
public sealed record ResultRow(string Key, string Label, int Indent, IReadOnlyList<ResultCell> Cells, ResultRowKind Kind = ResultRowKind.Data);

/// <summary>
/// The numbers of one row in one column, and how they combine for display: a pattern naming the
/// statistics in braces, e.g. "{n} ({percent})" or "({lower}, {upper})".
/// </summary>
public sealed record ResultCell(string Column, string Pattern, IReadOnlyList<StatisticValue> Values);

/// <summary>Where a table's numbers came from.</summary>
public sealed record TableProvenance(string SpecFile, IReadOnlyList<string> Datasets);
