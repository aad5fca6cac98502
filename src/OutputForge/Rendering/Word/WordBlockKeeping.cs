using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Which body rows Word keeps on the page of the row after them. A section label always stays with the
/// first row it introduces; a short block (the rows between two spacer rows, e.g. one visit's categories
/// or a stratified analysis) is kept whole, so that a page never starts with the last row or two of a
/// block whose heading is on the page before. Longer blocks break where Word breaks them, each row
/// whole, with the column headers repeated.
/// </summary>
public static class WordBlockKeeping
{
    /// <summary>The longest block kept on one page: about a third of a landscape page at 9 pt (common practice).</summary>
    public const int MaxKeptRows = 15;

    public static bool[] KeepWithNext(IReadOnlyList<BodyRow> rows)
    {
        var keep = new bool[rows.Count];
        var start = 0;
        for (var r = 0; r <= rows.Count; r++)
        {
            if (r < rows.Count && rows[r].Kind != RowKind.Blank)
            {
                continue;
            }
            // rows[start .. r - 1] is one block.
            if (r - start <= MaxKeptRows)
            {
                for (var k = start; k < r - 1; k++)
                {
                    keep[k] = true;
                }
            }
            start = r + 1;
        }
        for (var r = 0; r < rows.Count; r++)
        {
            keep[r] |= rows[r].Kind == RowKind.Section;
        }
        return keep;
    }
}
