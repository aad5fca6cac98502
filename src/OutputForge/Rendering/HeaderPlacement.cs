using OutputForge.Layout;

namespace OutputForge.Rendering;

/// <summary>A header cell together with the index of the first column it covers.</summary>
public sealed record PlacedHeaderCell(HeaderCell Cell, int FirstColumn)
{
    public int LastColumn => FirstColumn + Cell.Span - 1;

    /// <summary>
    /// Header rows with each cell's column position, in the order the cells appear.
    /// Assumes <see cref="TableShape.Check"/> has passed.
    /// </summary>
    public static IReadOnlyList<PlacedHeaderCell> Place(HeaderRow row)
    {
        var placed = new List<PlacedHeaderCell>(row.Cells.Count);
        int column = 0;
        foreach (var cell in row.Cells)
        {
            placed.Add(new PlacedHeaderCell(cell, column));
            column += cell.Span;
        }
        return placed;
    }
}
