using System.Collections;

namespace OutputForge.Data;

/// <summary>
/// The "line" of each row of a dataset read from a file without lines in the CSV sense (XPT, Dataset-JSON): the row's
/// own number, 1-based, plus <paramref name="offset"/> (1 for NDJSON, whose first line is the metadata). Held as a
/// rule, not as one integer per row.
/// </summary>
internal sealed class RowNumbers(int count, int offset = 0) : IReadOnlyList<int>
{
    public int this[int index] => (uint)index < (uint)count ? index + 1 + offset : throw new ArgumentOutOfRangeException(nameof(index));

    public int Count => count;

    public IEnumerator<int> GetEnumerator() => Enumerable.Range(1 + offset, count).GetEnumerator();

    IEnumerator IEnumerable.GetEnumerator() => GetEnumerator();
}
