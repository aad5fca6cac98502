using System.Globalization;

namespace OutputForge.Cli.Calculator;

/// <summary>
/// Reads tables of counts written on the command line: cells separated by ",", rows by ";",
/// strata by "|" (e.g. "12,5;7,9|3,8;6,2").
/// </summary>
public static class CountsParser
{
    public static int[,] Table(string text, string option = "--counts")
    {
        var rows = text.Split(';', StringSplitOptions.TrimEntries);
        var cells = rows.Select((row, r) => row.Split(',', StringSplitOptions.TrimEntries).Select((cell, c) => Count(cell, r, c, option)).ToArray()).ToArray();
        var width = cells[0].Length;
        for (var r = 0; r < cells.Length; r++)
        {
            if (cells[r].Length != width)
            {
                throw new CalcInputException($"{option}: row {r + 1} has {cells[r].Length} counts but row 1 has {width} (rows are separated by ';', counts by ',')");
            }
        }
        if (cells.Length < 2 || width < 2)
        {
            throw new CalcInputException($"{option}: a table needs at least 2 rows and 2 columns, e.g. \"12,5;7,9\"");
        }
        var table = new int[cells.Length, width];
        for (var r = 0; r < cells.Length; r++)
        {
            for (var c = 0; c < width; c++)
            {
                table[r, c] = cells[r][c];
            }
        }
        return table;
    }

    public static IReadOnlyList<int[,]> Strata(string text)
    {
        var strata = text.Split('|', StringSplitOptions.TrimEntries).Select((s, k) =>
        {
            try
            {
                return Table(s);
            }
            catch (CalcInputException e)
            {
                throw new CalcInputException($"stratum {k + 1}: {e.Message}");
            }
        }).ToList();
        var (rows, columns) = (strata[0].GetLength(0), strata[0].GetLength(1));
        if (strata.Any(s => s.GetLength(0) != rows || s.GetLength(1) != columns))
        {
            throw new CalcInputException($"--counts: every stratum must have the same shape as the first ({rows} x {columns})");
        }
        return strata;
    }

    private static int Count(string cell, int row, int column, string option)
    {
        if (!int.TryParse(cell, NumberStyles.None, CultureInfo.InvariantCulture, out var count))
        {
            throw new CalcInputException($"{option}: '{cell}' in row {row + 1}, column {column + 1} is not a whole non-negative count");
        }
        return count;
    }
}
