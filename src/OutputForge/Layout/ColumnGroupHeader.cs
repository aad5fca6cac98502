using OutputForge.Results;

namespace OutputForge.Layout;

/// <summary>
/// The header row that prints each column group's label once over the columns it covers, above
/// the arm labels; columns outside every group get an empty cell. A group whose columns are not
/// next to each other would need its label twice and so is refused.
/// </summary>
public static class ColumnGroupHeader
{
    /// <summary>The spanning row, or null when no group covers a column of this table.</summary>
    public static HeaderRow? Build(IReadOnlyList<ResultColumn> columns, IReadOnlyList<ColumnGroup> groups)
    {
        var groupOfColumn = new Dictionary<string, ColumnGroup>(StringComparer.Ordinal);
        foreach (var group in groups)
        {
            foreach (var key in group.ColumnKeys)
            {
                if (!groupOfColumn.TryAdd(key, group))
                    throw new ColumnGroupException(group.Where, $"the arm '{key}' is already in the group '{groupOfColumn[key].Label}'");
            }
        }
        var cells = new List<HeaderCell> { new(string.Empty) };
        var printed = new HashSet<ColumnGroup>();
        int c = 0;
        while (c < columns.Count)
        {
            if (!groupOfColumn.TryGetValue(columns[c].Key, out var group))
            {
                cells.Add(new HeaderCell(string.Empty));
                c++;
                continue;
            }
            int span = 1;
            while (c + span < columns.Count && groupOfColumn.GetValueOrDefault(columns[c + span].Key) == group)
                span++;
            if (!printed.Add(group))
                throw new ColumnGroupException(group.Where,
                    $"the arms of the group '{group.Label}' are not next to each other in the arm order (column '{columns[c].Label}' stands apart)");
            cells.Add(new HeaderCell(group.Label, span));
            c += span;
        }
        return printed.Count == 0 ? null : new HeaderRow(cells);
    }
}
