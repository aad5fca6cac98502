using System.Globalization;
using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// Types one column while it is read. A column is numeric when every non-missing value reads as an
/// invariant-culture number, a date when every non-missing value is an ISO 8601 date (YYYY-MM-DD), and
/// text otherwise. Values in <see cref="CanonicalText"/> form are stored as numbers only (their text is
/// rebuilt on request), so large numeric and date columns hold no string per cell; any other value keeps
/// its text as written.
/// </summary>
internal sealed class ColumnBuilder
{
    private readonly string _name;
    private readonly int _capacity;
    // Allocated on the first value that needs them: a column that turns out to be text from its first value
    // never holds numbers, and one whose values are all canonical never holds strings.
    private double[]? _numbers;
    private sbyte[]? _decimals;
    private string?[]? _text;
    private bool _numeric = true;
    private bool _dates = true;
    private bool _any;
    /// <summary>True when canonical values were stored as dates (day numbers), false when as numbers: a column holds only one of the two.</summary>
    private bool _canonicalDates;
    private string? _evidence;
    private int _count;

    public ColumnBuilder(string name, int capacity)
    {
        _name = name;
        _capacity = capacity;
    }

    /// <summary>Text only: the column is text and no value was stored as a number, so numbers and markers are not kept.</summary>
    private bool TextOnly => !_numeric && !_dates && _decimals is null;

    public void AddMissing()
    {
        if (_decimals is not null)
        {
            _numbers![_count] = double.NaN;
            _decimals[_count] = DataColumn.MissingValue;
        }
        _count++;
    }

    /// <summary>Numbers and per-row markers, the rows before the first value marked missing.</summary>
    private void EnsureNumbers()
    {
        if (_decimals is not null) return;
        _numbers = new double[_capacity];
        _decimals = new sbyte[_capacity];
        _numbers.AsSpan(0, _count).Fill(double.NaN);
        _decimals.AsSpan(0, _count).Fill(DataColumn.MissingValue);
    }

    /// <summary>Stores a value given in canonical form without making a string; false when the general path must read it.</summary>
    public bool TryAddCanonical(ReadOnlySpan<byte> utf8)
    {
        if (_numeric)
        {
            if (!CanonicalText.TryParseNumber(utf8, out var number, out var decimals)) return false;
            _dates = false;
            Store(number, (sbyte)decimals);
            return true;
        }
        if (_dates && CanonicalText.TryParseDate(utf8, out var day))
        {
            _canonicalDates = true;
            Store(day, 0);
            return true;
        }
        return false;
    }

    /// <summary>Stores a value as written, narrowing the column's type as the value requires.</summary>
    public void AddText(string value, int line)
    {
        _any = true;
        _text ??= new string?[_capacity];
        _text[_count] = value;
        if (TextOnly)
        {
            _count++;
            return;
        }
        var number = double.NaN;
        if (_numeric)
        {
            if (double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out var parsed) && double.IsFinite(parsed))
            {
                number = parsed;
            }
            else
            {
                _numeric = false;
                _evidence = $"'{Shorten(value)}' on line {line}";
            }
        }
        if (_dates)
        {
            if (value.Length == 10 && DateOnly.TryParseExact(value, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
            {
                if (!_numeric) number = date.DayNumber;
            }
            else
            {
                _dates = false;
            }
        }
        if (!TextOnly)
        {
            EnsureNumbers();
            _numbers![_count] = number;
            _decimals![_count] = DataColumn.WrittenValue;
        }
        _count++;
    }

    private void Store(double number, sbyte decimals)
    {
        _any = true;
        EnsureNumbers();
        _numbers![_count] = number;
        _decimals![_count] = decimals;
        _count++;
    }

    public DataColumn Build()
    {
        if (!_any)
        {
            return new DataColumn(_name, VariableKind.Text, new string?[_count], null, _count);
        }
        if (_numeric)
        {
            return DataColumn.Compact(_name, VariableKind.Number, _numbers!, _decimals!, _text, _count);
        }
        if (_dates)
        {
            return DataColumn.Compact(_name, VariableKind.Date, _numbers!, _decimals!, _text, _count);
        }
        // A text column: values read before the first text value may have been stored as canonical numbers or dates.
        var text = _text!;
        for (var i = 0; _decimals is not null && i < _count; i++)
        {
            if (_decimals[i] >= 0)
            {
                text[i] = _canonicalDates ? CanonicalText.FormatDate(_numbers![i]) : CanonicalText.FormatNumber(_numbers![i], _decimals[i]);
            }
        }
        return new DataColumn(_name, VariableKind.Text, text, null, _count) { TextEvidence = _evidence };
    }

    private static string Shorten(string value) => value.Length <= 20 ? value : value[..20] + "...";
}
