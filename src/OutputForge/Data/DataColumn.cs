using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// One variable of a dataset. Every column keeps the values as written (for display and text
/// comparisons); numeric and date columns also keep parsed numbers (dates as day numbers), with
/// NaN for missing. An empty field is a missing value.
/// </summary>
public sealed class DataColumn : IVariable
{
    private readonly string?[] _text;
    private readonly double[]? _numbers;

    internal DataColumn(string name, VariableKind kind, string?[] text, double[]? numbers)
    {
        Name = name;
        Kind = kind;
        _text = text;
        _numbers = numbers;
    }

    public string Name { get; }
    public VariableKind Kind { get; }
    public int Length => _text.Length;

    public bool IsMissing(int row) => _text[row] is null;

    public string? GetText(int row) => _text[row];

    public double GetNumber(int row) => _numbers is null ? double.NaN : _numbers[row];

    /// <summary>The distinct non-missing values as written, in first-seen order.</summary>
    public IReadOnlyList<string> DistinctValues()
    {
        var seen = new HashSet<string>(StringComparer.Ordinal);
        var values = new List<string>();
        foreach (var value in _text)
        {
            if (value is not null && seen.Add(value))
            {
                values.Add(value);
            }
        }
        return values;
    }
}
