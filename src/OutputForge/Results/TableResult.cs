namespace OutputForge.Results;

/// <summary>
/// Everything a table says, as data: its columns, rows and numbers, the notes that explain the
/// methods used, and the warnings raised while computing. Layout turns it into a display.
/// The notes are data (<see cref="Notes"/>): Layout words and letters them. <see cref="MethodNotes"/> and
/// <see cref="Warnings"/> hold text already worded before Layout (the data stage's warnings, and any part of a kind
/// not yet moved to structured notes); Layout prints them first.
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

    /// <summary>The table's notes as data, footnotes in print order and warnings in the order they arose (see <see cref="ResultNote"/>).</summary>
    public IReadOnlyList<ResultNote> Notes { get; init; } = [];

    /// <summary>The table without its warnings (worded or structured), as a mock shell shows it.</summary>
    public TableResult WithoutWarnings() => this with { Warnings = [], Notes = Notes.Where(n => n.Role != NoteRole.Warning).ToList() };
}

/// <summary>
/// A result column. <paramref name="Key"/> is the stable key used in results.json (<see cref="ResultKey"/>; e.g. the
/// arm value in key form: "placebo", "qf-217-10-mg", "total").
/// A column may refer to footnotes (<see cref="NoteRefs"/>, the notes' ids); Layout appends their letters to the label.
/// </summary>
public sealed record ResultColumn(string Key, string Label, int? SubjectCount)
{
    /// <summary>Ids of the footnotes the column refers to; Layout prints their letters after the label, e.g. "p-value [a]".</summary>
    public IReadOnlyList<string> NoteRefs { get; init; } = [];

    /// <summary>The confidence level that a "{level}" in <see cref="Label"/> stands for (0.95 prints as "95%").</summary>
    public double? Level { get; init; }
}

public enum ResultRowKind { Data, Section, Blank }

/// <summary>
/// A result row. <paramref name="Key"/> is stable and readable (<see cref="ResultKey"/>; e.g. "responders",
/// "difference-ci", "sex/f"), so that a QC programmer can write it by hand; Layout tells equal keys apart.
/// A row may refer to footnotes (<see cref="NoteRefs"/>) and name its confidence level in its label as "{level}";
/// Layout writes both ("{level} CI" with level 0.95 and a reference to the first footnote prints "95% CI [a]").
/// </summary>
public sealed record ResultRow(string Key, string Label, int Indent, IReadOnlyList<ResultCell> Cells, ResultRowKind Kind = ResultRowKind.Data)
{
    /// <summary>Ids of the footnotes the row refers to, in the order their letters are printed after the label.</summary>
    public IReadOnlyList<string> NoteRefs { get; init; } = [];

    /// <summary>The confidence level that a "{level}" in <see cref="Label"/> stands for.</summary>
    public double? Level { get; init; }
}

/// <summary>
/// The numbers of one row in one column, and how they combine for display: a pattern naming the
/// statistics in braces, e.g. "{n} ({percent})" or "({lower}, {upper})".
/// </summary>
public sealed record ResultCell(string Column, string Pattern, IReadOnlyList<StatisticValue> Values)
{
    /// <summary>The population the cell's numbers are of when it is not the table's (e.g. "subjects evaluated"); null for the table's.</summary>
    public string? Population { get; init; }
}

/// <summary>Where a table's numbers came from.</summary>
public sealed record TableProvenance(string SpecFile, IReadOnlyList<string> Datasets);
