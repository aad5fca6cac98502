namespace OutputForge.Results;

/// <summary>
/// One number of one table as written to results.json: where it stands (table, row and column
/// keys, with their displayed labels), what it is (statistic), its raw value at full precision
/// and its text as displayed. A number that could not be estimated has a null value and a note.
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
    string? Note);
