namespace OutputForge.Demo;

/// <summary>
/// Permuted-block randomization within strata, 1:1:1 with blocks of six (two of each arm), the usual
/// scheme of a parallel-group trial (ICH E9 section 2.3.1). Each stratum draws from its own sequence of
/// blocks, so arm counts within a stratum never differ by more than two.
/// </summary>
internal sealed class StratifiedBlockRandomizer
{
    private const int BlockSize = 6;
    private readonly Xoshiro256StarStar _random;
    private readonly Dictionary<string, Queue<int>> _openBlocks = new(StringComparer.Ordinal);

    public StratifiedBlockRandomizer(Xoshiro256StarStar random) => _random = random;

    /// <summary>The next arm index for a subject entering the given stratum.</summary>
    public int Next(string stratum)
    {
        if (!_openBlocks.TryGetValue(stratum, out var block))
        {
            block = new Queue<int>(BlockSize);
            _openBlocks[stratum] = block;
        }
        if (block.Count == 0)
            foreach (var arm in NewBlock()) block.Enqueue(arm);
        return block.Dequeue();
    }

    private int[] NewBlock()
    {
        var slots = new int[BlockSize];
        for (var i = 0; i < BlockSize; i++) slots[i] = i % 3;
        // Fisher-Yates shuffle (Knuth, TAOCP vol. 2, algorithm 3.4.2 P).
        for (var i = BlockSize - 1; i > 0; i--)
        {
            var j = _random.NextInt(i + 1);
            (slots[i], slots[j]) = (slots[j], slots[i]);
        }
        return slots;
    }
}
