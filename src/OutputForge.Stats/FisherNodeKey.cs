namespace OutputForge.Stats;

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
        var hash = new HashCode();
        foreach (int t in totals)
        {
            hash.Add(t);
        }
        _hash = hash.ToHashCode();
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
}
