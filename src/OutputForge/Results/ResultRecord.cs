namespace OutputForge.Results;

/// <summary>
/// One number of one table as written to results.json: where it stands (table, row and column
/// keys, with their displayed labels), what it is (statistic), its raw value at full precision
/// and its text as displayed. A number that could not be estimated has a null value and a note.
/// It also says which confidence level and sidedness it comes from, and which footnotes its row and column refer to.
/// </summary>
public sealed record ResultRecord(
    string Table,
    string Row,
    string Column,
    string Statistic,
    double? Value,
    string Formatted,
    string RowLabel,
    string ColumnLabel,
    string? Method,
    string? Note)
{
    /// <summary>The confidence level of an interval bound (0.95); null where none applies.</summary>
    public double? Level { get; init; }

    /// <summary>The tails a p-value or an interval covers; null where none applies.</summary>
    public Sidedness? Sided { get; init; }

    /// <summary>The letters of the footnotes its row and column refer to, as printed ("[a]").</summary>
    public IReadOnlyList<string> Footnotes { get; init; } = [];

    /// <summary>
    /// The letters of the footnotes of the headings it stands under (a visit, a system organ class, a model: the nearest
    /// row of each smaller indent above it, up to a blank row), outermost first, as printed; a letter of its own row or
    /// column is not repeated here.
    /// </summary>
    public IReadOnlyList<string> HeadingFootnotes { get; init; } = [];

    /// <summary>The population it was computed on, as the spec names it; null where the caller gave none (a result laid out alone).</summary>
    public RecordPopulation? Population { get; init; }
}
