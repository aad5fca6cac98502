namespace OutputForge.Data;

/// <summary>
/// The rows of each distinct value of a column, built once and shared by every table that selects
/// records by that column (e.g. PARAMCD, AVISIT), so a table reads only its own records rather than
/// scanning the whole dataset.
/// </summary>
internal sealed class ValueIndex
{
    private readonly Dictionary<string, int[]> _rows;

    private ValueIndex(IReadOnlyList<string> values, Dictionary<string, int[]> rows)
    {
        Values = values;
        _rows = rows;
    }

    /// <summary>Distinct non-missing values as written, in first-seen order.</summary>
    public IReadOnlyList<string> Values { get; }

    public IReadOnlyList<int> RowsOf(string value) => _rows.TryGetValue(value, out var rows) ? rows : [];

    public static ValueIndex Of(DataColumn column)
    {
        var lists = new Dictionary<string, List<int>>(StringComparer.Ordinal);
        var values = new List<string>();
        for (var row = 0; row < column.Length; row++)
        {
            if (column.GetText(row) is not { } value) continue;
            if (!lists.TryGetValue(value, out var rows))
            {
                rows = [];
                lists[value] = rows;
                values.Add(value);
            }
            rows.Add(row);
        }
        return new ValueIndex(values, lists.ToDictionary(p => p.Key, p => p.Value.ToArray(), StringComparer.Ordinal));
    }
}
