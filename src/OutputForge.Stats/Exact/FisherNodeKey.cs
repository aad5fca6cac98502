namespace OutputForge.Stats.Exact;

/// <summary>
/// A node of the r x c Fisher network: the multiset of row totals still to be filled, kept sorted so
/// that partial tables differing only by a permutation of the rows merge (their completions are the
/// same up to that permutation, with the same values).
/// </summary>
internal sealed class FisherNodeKey : IEquatable<FisherNodeKey>
{
    private readonly int _hash;

    private FisherNodeKey(int[] totals)
    {
        Totals = totals;
        _hash = HashOf(totals);
    }

    public int[] Totals { get; }

    /// <summary>The node of these remaining totals; the array is sorted in place and kept.</summary>
    public static FisherNodeKey Of(int[] totals)
    {
        Array.Sort(totals);
        return new FisherNodeKey(totals);
    }

    public bool Equals(FisherNodeKey? other) => other is not null && Totals.AsSpan().SequenceEqual(other.Totals);

    public override bool Equals(object? obj) => Equals(obj as FisherNodeKey);

    public override int GetHashCode() => _hash;

    /// <summary>The hash of sorted totals, the same for a key and for a span holding its totals.</summary>
    public static int HashOf(ReadOnlySpan<int> totals)
    {
        var hash = new HashCode();
        foreach (int t in totals)
        {
            hash.Add(t);
        }
        return hash.ToHashCode();
    }
}

/// <summary>
/// Compares nodes, and lets a dictionary of nodes be searched with a span of sorted totals, so that the
/// bounds' dynamic programming looks up a child without allocating a key for it.
/// </summary>
internal sealed class FisherNodeKeyComparer : IEqualityComparer<FisherNodeKey>, IAlternateEqualityComparer<ReadOnlySpan<int>, FisherNodeKey>
{
    public static readonly FisherNodeKeyComparer Instance = new();

    public bool Equals(FisherNodeKey? x, FisherNodeKey? y) => x is null ? y is null : x.Equals(y);

    public int GetHashCode(FisherNodeKey key) => key.GetHashCode();

    public bool Equals(ReadOnlySpan<int> alternate, FisherNodeKey other) => alternate.SequenceEqual(other.Totals);

    public int GetHashCode(ReadOnlySpan<int> alternate) => FisherNodeKey.HashOf(alternate);

    public FisherNodeKey Create(ReadOnlySpan<int> alternate) => FisherNodeKey.Of(alternate.ToArray());
}
