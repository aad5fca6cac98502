namespace OutputForge.Data;

/// <summary>
/// The arrays of one column of a file, shared by the parts of the file that are read at the same time on several
/// cores (<see cref="CsvFileParts"/>): each part writes its rows into its own region, so the parts make no copies of
/// their own. An array is made on first use by any part (a column that is numbers throughout never holds strings).
/// </summary>
internal sealed class ColumnStore
{
    private double[]? _numbers;
    private sbyte[]? _decimals;
    private string?[]? _text;

    public ColumnStore(int capacity)
    {
        Capacity = capacity;
    }

    /// <summary>The rows the arrays hold: at least the rows of all the parts together.</summary>
    public int Capacity { get; }

    public double[] Numbers => LazyInitializer.EnsureInitialized(ref _numbers, () => new double[Capacity]);

    public sbyte[] Decimals => LazyInitializer.EnsureInitialized(ref _decimals, () => new sbyte[Capacity]);

    public string?[] Text => LazyInitializer.EnsureInitialized(ref _text, () => new string?[Capacity]);

    public bool HasText => Volatile.Read(ref _text) is not null;
}
