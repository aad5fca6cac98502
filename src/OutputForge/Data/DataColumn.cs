using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// One variable of a dataset. Every column gives the values as written (for display and text
/// comparisons); numeric and date columns also keep parsed numbers (dates as day numbers), with
/// NaN for missing. An empty field is a missing value. Numeric and date values written in canonical
/// form (<see cref="CanonicalText"/>) keep no string: their text is rebuilt, identical, on request.
/// </summary>
public sealed class DataColumn : IVariable
{
    internal const sbyte MissingValue = -1;
    internal const sbyte WrittenValue = -2;

    private readonly string?[]? _text;
    private readonly double[]? _numbers;
    /// <summary>Per row: <see cref="MissingValue"/>, <see cref="WrittenValue"/> (text kept in _text), or the decimals of a canonical value.</summary>
    private readonly sbyte[]? _decimals;
    private readonly int _length;
    private readonly Lazy<ValueIndex> _index;

    internal DataColumn(string name, VariableKind kind, string?[] text, double[]? numbers)
        : this(name, kind, text, numbers, null, text.Length)
    {
    }

    internal DataColumn(string name, VariableKind kind, string?[] text, double[]? numbers, int length)
        : this(name, kind, text, numbers, null, length)
    {
    }

    private DataColumn(string name, VariableKind kind, string?[]? text, double[]? numbers, sbyte[]? decimals, int length)
    {
        Name = name;
        Kind = kind;
        _text = text;
        _numbers = numbers;
        _decimals = decimals;
        _length = length;
        _index = new Lazy<ValueIndex>(() => ValueIndex.Of(this), LazyThreadSafetyMode.ExecutionAndPublication);
    }

    /// <summary>A numeric or date column whose canonical values are held as numbers only.</summary>
    internal static DataColumn Compact(string name, VariableKind kind, double[] numbers, sbyte[] decimals, string?[]? text, int length) =>
        new(name, kind, text, numbers, decimals, length);

    public string Name { get; }
    public VariableKind Kind { get; }
    public int Length => _length;

    /// <summary>The variable's label as the file gives it (XPT and Dataset-JSON files carry one; CSV has none).</summary>
    public string? Label { get; internal set; }

    /// <summary>
    /// The special missing value of a missing number read from an XPT file, where it is not the plain '.': '_' or
    /// 'A'-'Z' (for .A-.Z); null for any other row. The value is missing all the same.
    /// </summary>
    public char? MissingLetter(int row) => _missingLetters is not null && _missingLetters.TryGetValue(row, out var letter) ? letter : null;

    private IReadOnlyDictionary<int, char>? _missingLetters;

    internal void KeepMissingLetters(IReadOnlyDictionary<int, char>? letters) => _missingLetters = letters;

    /// <summary>For a text column whose first values were numbers: the first value that is not (for messages).</summary>
    public string? TextEvidence { get; init; }

    string? IVariable.KindNote => TextEvidence is null || Owner is null ? TextEvidence : $"{TextEvidence} of {Path.GetFileName(Owner.File)}";

    /// <summary>The dataset the column belongs to (set when the dataset is made), for the places named in messages.</summary>
    internal Dataset? Owner { get; set; }

    public string? FirstValueNot(Func<string, bool> accept)
    {
        for (var row = 0; row < _length; row++)
        {
            if (GetText(row) is { } value && !accept(value))
            {
                var shown = value.Length <= 40 ? value : value[..40] + "...";
                return Owner is null ? $"'{shown}' in row {row + 1}" : $"'{shown}' on line {Owner.LineOfRow[row]} of {Path.GetFileName(Owner.File)}";
            }
        }
        return null;
    }

    public bool IsMissing(int row) => _decimals is null ? _text![row] is null : _decimals[row] == MissingValue;

    public string? GetText(int row)
    {
        if (_decimals is null)
        {
            return _text![row];
        }
        var decimals = _decimals[row];
        return decimals switch
        {
            MissingValue => null,
            WrittenValue => _text![row],
            _ => Kind == VariableKind.Date ? CanonicalText.FormatDate(_numbers![row]) : CanonicalText.FormatNumber(_numbers![row], decimals),
        };
    }

    public double GetNumber(int row) => _numbers is null ? double.NaN : _numbers[row];

    /// <summary>The distinct non-missing values as written, in first-seen order.</summary>
    public IReadOnlyList<string> DistinctValues() => _index.Value.Values;

    /// <summary>The rows holding <paramref name="value"/> as written, in row order (built once per column, on first use).</summary>
    public IReadOnlyList<int> RowsWith(string value) => _index.Value.RowsOf(value);
}
