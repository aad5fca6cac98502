namespace OutputForge.Stats.Contingency;

/// <summary>
/// Validation and margins of an r x c table of counts, and the removal of rows and columns whose
/// total is zero (they carry no information under independence and make expected counts zero).
/// </summary>
internal static class TableMargins
{
    public static void Validate(int[,] table)
    {
        ArgumentNullException.ThrowIfNull(table);
        for (int i = 0; i < table.GetLength(0); i++)
        {
            for (int j = 0; j < table.GetLength(1); j++)
            {
                if (table[i, j] < 0)
                {
                    throw new ArgumentOutOfRangeException(nameof(table), table[i, j], $"Cell ({i + 1}, {j + 1}) of the table is negative; counts must be zero or more.");
                }
            }
        }
    }

    public static long[] RowTotals(int[,] table)
    {
        var totals = new long[table.GetLength(0)];
        for (int i = 0; i < totals.Length; i++)
        {
            for (int j = 0; j < table.GetLength(1); j++)
            {
                totals[i] += table[i, j];
            }
        }
        return totals;
    }

    public static long[] ColumnTotals(int[,] table)
    {
        var totals = new long[table.GetLength(1)];
        for (int j = 0; j < totals.Length; j++)
        {
            for (int i = 0; i < table.GetLength(0); i++)
            {
                totals[j] += table[i, j];
            }
        }
        return totals;
    }

    /// <summary>
    /// The table without its zero-total rows and columns, with one note per dropped line
    /// (numbered from 1 as the caller laid the table out).
    /// </summary>
    public static (int[,] Table, List<string> Notes) DropEmptyLines(int[,] table)
    {
        long[] rows = RowTotals(table);
        long[] columns = ColumnTotals(table);
        var keptRows = Enumerable.Range(0, rows.Length).Where(i => rows[i] > 0).ToArray();
        var keptColumns = Enumerable.Range(0, columns.Length).Where(j => columns[j] > 0).ToArray();
        var notes = new List<string>();
        foreach (int i in Enumerable.Range(0, rows.Length).Where(i => rows[i] == 0))
        {
            notes.Add($"Row {i + 1} has a zero total and was left out of the test.");
        }
        foreach (int j in Enumerable.Range(0, columns.Length).Where(j => columns[j] == 0))
        {
            notes.Add($"Column {j + 1} has a zero total and was left out of the test.");
        }
        var reduced = new int[keptRows.Length, keptColumns.Length];
        for (int i = 0; i < keptRows.Length; i++)
        {
            for (int j = 0; j < keptColumns.Length; j++)
            {
                reduced[i, j] = table[keptRows[i], keptColumns[j]];
            }
        }
        return (reduced, notes);
    }
}
