using System.Globalization;
using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// Builds one column whose type the file declares (an XPT variable, a Dataset-JSON column), in the same form the CSV
/// reader gives (<see cref="DataColumn"/>): numbers as doubles with NaN for missing, dates as day numbers, text as
/// strings, a missing value as null text. A value's text ("as written", used by conditions and category labels) is:
/// for a number read from text (Dataset-JSON), that text; for a number stored in binary (XPT), its shortest decimal
/// text without exponent (<see cref="ShortestDecimals"/>), else the shortest round-trip text; for a date, YYYY-MM-DD.
/// Canonical values (<see cref="CanonicalText"/>) keep no string, as in the CSV reader.
/// </summary>
internal sealed class TypedColumnBuilder
{
    private static readonly double[] PowersOfTen =
        [1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15];

    private readonly string _name;
    private VariableKind _kind;
    private double[] _numbers = [];
    private sbyte[] _decimals = [];
    private string?[]? _text;
    private int _count;
    private RepeatedText _repeat;
    private TextPool? _pool;

    public TypedColumnBuilder(string name, VariableKind kind, int capacity)
    {
        _name = name;
        _kind = kind;
        capacity = Math.Max(capacity, 16);
        if (kind == VariableKind.Text)
        {
            _text = new string?[capacity];
        }
        else
        {
            _numbers = new double[capacity];
            _decimals = new sbyte[capacity];
        }
    }

    public string Name => _name;

    public VariableKind Kind => _kind;

    public string? Label { get; init; }

    public int Count => _count;

    private void Grow()
    {
        var size = Math.Max(16, checked(_count * 2));
        if (_kind == VariableKind.Text)
        {
            if (_text!.Length <= _count) Array.Resize(ref _text, size);
            return;
        }
        if (_numbers.Length <= _count)
        {
            Array.Resize(ref _numbers, size);
            Array.Resize(ref _decimals, size);
        }
        if (_text is not null && _text.Length <= _count) Array.Resize(ref _text, size);
    }

    public void AddMissing()
    {
        if (Full) Grow();
        if (_kind == VariableKind.Text)
        {
            _text![_count++] = null;
            return;
        }
        _numbers[_count] = double.NaN;
        _decimals[_count] = DataColumn.MissingValue;
        if (_text is not null) _text[_count] = null;
        _count++;
    }

    /// <summary>A missing number that is one of the special missing values (XPT .A-.Z and ._): the letter is kept beside it.</summary>
    public void AddMissing(char letter)
    {
        if (letter != '.')
        {
            (_letters ??= [])[_count] = letter;
        }
        AddMissing();
    }

    private Dictionary<int, char>? _letters;

    private bool Full => _kind == VariableKind.Text ? _text!.Length <= _count : _numbers.Length <= _count || (_text is not null && _text.Length <= _count);

    /// <summary>A number held in binary: its text is its shortest decimal form.</summary>
    public void AddNumber(double value)
    {
        if (Full) Grow();
        if (value == 0) value = 0; // negative zero reads as zero: no file means "-0"
        if (ShortestDecimals(value) is { } decimals)
        {
            _numbers[_count] = value;
            _decimals[_count++] = decimals;
            return;
        }
        AddWritten(value, value.ToString("R", CultureInfo.InvariantCulture));
    }

    /// <summary>A number written as text (UTF-8, already checked to parse): kept as written.</summary>
    public void AddNumber(double value, ReadOnlySpan<byte> written)
    {
        if (Full) Grow();
        if (CanonicalText.TryParseNumber(written, out var canonical, out var decimals))
        {
            _numbers[_count] = canonical;
            _decimals[_count++] = (sbyte)decimals;
            return;
        }
        AddWritten(value, System.Text.Encoding.UTF8.GetString(written));
    }

    /// <summary>A number written as text in canonical form (<see cref="CanonicalText"/>), already parsed: no string is kept.</summary>
    public void AddCanonical(double value, int decimals)
    {
        if (Full) Grow();
        _numbers[_count] = value;
        _decimals[_count++] = (sbyte)decimals;
    }

    private void AddWritten(double value, string text)
    {
        _text ??= new string?[_numbers.Length];
        _numbers[_count] = value;
        _decimals[_count] = DataColumn.WrittenValue;
        _text[_count++] = text;
    }

    /// <summary>A date, as its day number (<see cref="DateOnly.DayNumber"/>).</summary>
    public void AddDay(int dayNumber)
    {
        if (Full) Grow();
        _numbers[_count] = dayNumber;
        _decimals[_count++] = 0;
    }

    /// <summary>
    /// A date column's value given as text: a full ISO 8601 date is stored as a date; any other text (a partial date)
    /// turns the column into text, as the CSV reader types such a column.
    /// </summary>
    public void AddDateText(string value)
    {
        if (_kind == VariableKind.Date)
        {
            if (value.Length == 10 && DateOnly.TryParseExact(value, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out var date))
            {
                AddDay(date.DayNumber);
                return;
            }
            BecomeText();
        }
        AddText(value);
    }

    private void BecomeText()
    {
        var text = new string?[Math.Max(16, _numbers.Length)];
        for (var i = 0; i < _count; i++)
        {
            text[i] = _decimals[i] == DataColumn.MissingValue ? null : CanonicalText.FormatDate(_numbers[i]);
        }
        _text = text;
        _numbers = [];
        _decimals = [];
        _kind = VariableKind.Text;
    }

    public void AddText(string value)
    {
        if (Full) Grow();
        _text![_count++] = value;
    }

    public delegate string Decoder(ReadOnlySpan<byte> bytes);

    /// <summary>Text given as bytes; a value repeating the one above, or one of the column's short values seen before, is the same string, decoded once.</summary>
    public void AddText(ReadOnlySpan<byte> utf8, Decoder decode)
    {
        if (Full) Grow();
        if (_repeat.Matches(utf8) is { } repeated)
        {
            _text![_count++] = repeated;
            return;
        }
        _pool ??= new TextPool();
        var value = _pool.Get(utf8, decode);
        _repeat.Remember(utf8, value);
        _text![_count++] = value;
    }

    /// <summary>
    /// The builders of consecutive parts of one column (read at the same time on several cores) joined into one, as if
    /// one builder had read every value: a date column that is text in any part (a partial date) is text throughout.
    /// </summary>
    public static TypedColumnBuilder Join(IReadOnlyList<TypedColumnBuilder> parts)
    {
        if (parts.Any(p => p._kind == VariableKind.Text))
        {
            foreach (var part in parts.Where(p => p._kind == VariableKind.Date)) part.BecomeText();
        }
        var first = parts[0];
        var total = parts.Sum(p => p._count);
        var joined = new TypedColumnBuilder(first._name, first._kind, total) { Label = first.Label };
        var text = parts.Any(p => p._text is not null);
        if (text && joined._text is null) joined._text = new string?[Math.Max(16, total)];
        var at = 0;
        foreach (var part in parts)
        {
            if (joined._kind != VariableKind.Text)
            {
                Array.Copy(part._numbers, 0, joined._numbers, at, part._count);
                Array.Copy(part._decimals, 0, joined._decimals, at, part._count);
            }
            if (part._text is not null) Array.Copy(part._text, 0, joined._text!, at, part._count);
            at += part._count;
        }
        joined._count = total;
        return joined;
    }

    public DataColumn Build()
    {
        if (_kind == VariableKind.Text)
        {
            return new DataColumn(_name, VariableKind.Text, _text!, null, _count) { Label = Label };
        }
        var column = DataColumn.Compact(_name, _kind, _numbers, _decimals, _text, _count);
        column.Label = Label;
        column.KeepMissingLetters(_letters);
        return column;
    }

    /// <summary>
    /// The fewest decimals d (0 to 15) for which the value is m / 10^d with |m| below 10^15, i.e. for which its
    /// canonical text with d decimals reads back as the same double; null when there is none (very large or small
    /// values, or more than 15 significant digits), whose text is then the shortest round-trip form.
    /// </summary>
    internal static sbyte? ShortestDecimals(double value)
    {
        if (!double.IsFinite(value)) return null;
        var magnitude = Math.Abs(value);
        if (magnitude >= 1e15) return null;
        if (value == Math.Floor(value)) return 0;
        for (var d = 1; d < PowersOfTen.Length; d++)
        {
            var scaled = Math.Round(value * PowersOfTen[d]);
            if (Math.Abs(scaled) >= 1e15) return null;
            if (scaled / PowersOfTen[d] == value) return (sbyte)d;
        }
        return null;
    }
}
