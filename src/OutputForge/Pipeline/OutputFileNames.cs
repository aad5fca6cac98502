namespace OutputForge.Pipeline;

/// <summary>
/// File names derived from table ids. Ids are restricted by the table schema to letters, digits,
/// dots, dashes and underscores, and to <see cref="Spec.TableIds.MaxLength"/> characters; this guard keeps any other id
/// from leaving the output folder.
/// </summary>
public static class OutputFileNames
{
    /// <summary>Base name of the combined document and workbook (all tables of a run).</summary>
    public const string Combined = "all-tables";

    public static string ForTable(string tableId, string extension)
    {
        if (tableId.Length == 0 || tableId.Any(c => !(char.IsAsciiLetterOrDigit(c) || c is '.' or '-' or '_')) || tableId.StartsWith('.'))
        {
            throw new RunException($"table id '{tableId}' cannot name an output file (use letters, digits, '.', '-' and '_')");
        }
        return $"table-{tableId}{extension}";
    }

    /// <summary>The PNG of a table's figure, beside the table's other files: "table-14.2.5.1-forest.png".</summary>
    public static string ForFigure(string tableId, string figureName)
    {
        if (figureName.Length == 0 || figureName.Any(c => !(char.IsAsciiLetterOrDigit(c) || c == '-')))
        {
            throw new RunException($"figure name '{figureName}' cannot name an output file (use letters, digits and '-')");
        }
        return ForTable(tableId, $"-{figureName}.png");
    }
}
