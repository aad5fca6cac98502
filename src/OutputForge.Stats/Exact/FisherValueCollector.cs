namespace OutputForge.Stats.Exact;

/// <summary>
/// Gathers the values arriving at one node of a Fisher network (past values in the forward direction,
/// completion values in the backward one), merging values that fall in the same cell of the
/// <see cref="FisherPastValues.MergeResolution"/> grid and adding their counts.
/// <para>
/// This is the innermost loop of the network algorithm (every undecided partial table passes through
/// <see cref="Add"/> once per column), so it is an open-addressing hash table with linear probing over
/// one array of (value, count) slots, at most half full: no per-entry objects, one multiplication for
/// the hash and, mostly, one memory access per value. An empty slot has count zero (every count
/// added is at least one); the grid cell of a slot is recomputed from its value when probing.
/// </para>
/// </summary>
internal sealed class FisherValueCollector
{
    private Slot[] _slots;
    private double[] _values;
    private int _mask;

    public FisherValueCollector(int expected = 8)
    {
        int capacity = 16;
        while (capacity < expected * 2)
        {
            capacity <<= 1;
        }
        _slots = new Slot[capacity];
        _values = new double[capacity];
        _mask = capacity - 1;
    }

    /// <summary>How many distinct grid cells have arrived.</summary>
    public int Count { get; private set; }

    /// <summary>Adds <paramref name="count"/> partial tables of value <paramref name="value"/>; the first exact value of a cell is kept.</summary>
    public void Add(double value, double count)
    {
        long key = FisherPastValues.KeyOf(value);
        int slot = Hash(key) & _mask;
        while (true)
        {
            ref var entry = ref _slots[slot];
            if (entry.Count == 0)
            {
                entry = new Slot(key, count);
                _values[slot] = value;
                if (++Count * 2 > _slots.Length)
                {
                    Grow();
                }
                return;
            }
            if (entry.Key == key)
            {
                entry.Count += count;
                return;
            }
            slot = (slot + 1) & _mask;
        }
    }

    /// <summary>The collected values in increasing order with their counts and running log-sums.</summary>
    public FisherPastValues ToPastValues()
    {
        var values = new double[Count];
        var counts = new double[Count];
        int k = 0;
        for (int slot = 0; slot < _slots.Length; slot++)
        {
            if (_slots[slot].Count != 0)
            {
                values[k] = _values[slot];
                counts[k] = _slots[slot].Count;
                k++;
            }
        }
        // Rounding to the grid is monotone, so the order of the kept values is the order of their cells.
        Array.Sort(values, counts);
        return FisherPastValues.Sorted(values, counts);
    }

    private static int Hash(long key) => (int)((ulong)(key * unchecked((long)0x9E3779B97F4A7C15)) >> 33);

    private void Grow()
    {
        var old = _slots;
        var oldValues = _values;
        _slots = new Slot[old.Length * 2];
        _values = new double[old.Length * 2];
        _mask = _slots.Length - 1;
        for (int i = 0; i < old.Length; i++)
        {
            if (old[i].Count != 0)
            {
                int slot = Hash(old[i].Key) & _mask;
                while (_slots[slot].Count != 0)
                {
                    slot = (slot + 1) & _mask;
                }
                _slots[slot] = old[i];
                _values[slot] = oldValues[i];
            }
        }
    }

    private struct Slot(long key, double count)
    {
        public long Key = key;
        public double Count = count;
    }
}
