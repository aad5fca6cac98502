namespace OutputForge.Data;

/// <summary>
/// The distinct short values of one text column, by their bytes: a value seen before (a visit, a parameter, a flag)
/// is the same string again, neither decoded nor stored anew, as the CSV reader's string pooling gives. Holds at
/// most <see cref="MaxEntries"/> values of at most <see cref="MaxBytes"/> bytes; others are decoded each time.
/// </summary>
internal sealed class TextPool
{
    public const int MaxBytes = 64;
    public const int MaxEntries = 4096;

    private const int Slots = MaxEntries * 2;

    private readonly byte[]?[] _keys = new byte[Slots][];
    private readonly string?[] _values = new string?[Slots];
    private int _count;

    /// <summary>The pooled string of <paramref name="bytes"/>, decoding and adding it when new.</summary>
    public string Get(ReadOnlySpan<byte> bytes, TypedColumnBuilder.Decoder decode)
    {
        if (bytes.Length > MaxBytes) return decode(bytes);
        var slot = (int)(Hash(bytes) & (Slots - 1));
        while (_keys[slot] is { } key)
        {
            if (bytes.SequenceEqual(key)) return _values[slot]!;
            slot = (slot + 1) & (Slots - 1);
        }
        var value = decode(bytes);
        if (_count < MaxEntries)
        {
            _keys[slot] = bytes.ToArray();
            _values[slot] = value;
            _count++;
        }
        return value;
    }

    /// <summary>FNV-1a (Fowler, Noll and Vo), 32 bits: short keys, no need for more.</summary>
    private static uint Hash(ReadOnlySpan<byte> bytes)
    {
        var hash = 2166136261u;
        foreach (var b in bytes)
        {
            hash = (hash ^ b) * 16777619u;
        }
        return hash;
    }
}
