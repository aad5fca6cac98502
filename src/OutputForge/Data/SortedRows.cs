namespace OutputForge.Data;

/// <summary>Operations on ascending lists of row indexes, such as the rows of a value in <see cref="DataColumn.RowsWith"/>.</summary>
public static class SortedRows
{
    /// <summary>The rows in both ascending lists, ascending: e.g. the records of one parameter at one visit.</summary>
    public static List<int> Intersection(IReadOnlyList<int> first, IReadOnlyList<int> second)
    {
        var both = new List<int>(Math.Min(first.Count, second.Count));
        for (int i = 0, j = 0; i < first.Count && j < second.Count;)
        {
            var a = first[i];
            var b = second[j];
            if (a < b)
            {
                i++;
            }
            else if (a > b)
            {
                j++;
            }
            else
            {
                both.Add(a);
                i++;
                j++;
            }
        }
        return both;
    }
}
