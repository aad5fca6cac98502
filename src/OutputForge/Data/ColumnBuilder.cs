using System.Globalization;
using OutputForge.Expressions;

namespace OutputForge.Data;

/// <summary>
/// Types one column while it is read. A column is numeric when every non-missing value reads as an
/// invariant-culture number, a date when every non-missing value is an ISO 8601 date (YYYY-MM-DD), and
/// text otherwise. Values in <see cref="CanonicalText"/> form are stored as numbers only (their text is
/// rebuilt on request), so large numeric and date columns hold no string per cell; any other value keeps
/// its text as written. A builder fills one region of a <see cref="ColumnStore"/>: the whole column, or one part of
/// a file read in parts, whose builders are then joined (<see cref="Join"/>) as if one had read the whole file.
/// </summary>
internal sealed class ColumnBuilder
{
    private readonly string _name;
    private readonly ColumnStore _store;
    /// <summary>The store's row of this builder's first value.</summary>
    private readonly int _offset;
    // Taken from the store on the first value that needs them: a column that turns out to be text from its first
    // value never holds numbers, and one whose values are all canonical never holds strings. Another part of the
    // file may have made the store's arrays already, so whether this builder stored numbers is kept apart.
    private double[]? _numbers;
    private sbyte[]? _decimals;
    private string?[]? _text;
    private bool _numeric = true;
    private bool _dates = true;
    private bool _any;
    /// <summary>True when canonical values were stored as dates (day numbers), false when as numbers: a column holds only one of the two.</summary>
    private bool _canonicalDates;
    private string? _evidence;
    /// <summary>The first value that reads as a number OutputForge cannot use (<see cref="UnusableNumber"/>), with its line.</summary>
    private (string Value, int Line, string Problem)? _unusable;
    private int _count;

    public ColumnBuilder(string name, int capacity)
        : this(name, new ColumnStore(capacity), 0)
    {
    }

    public ColumnBuilder(string name, ColumnStore store, int offset)
    {
        _name = name;
        _store = store;
        _offset = offset;
    }

    /// <summary>The values added so far.</summary>
    public int Count => _count;

    /// <summary>Text only: the column is text and no value was stored as a number, so numbers and markers are not kept.</summary>
    private bool TextOnly => !_numeric && !_dates && _decimals is null;

    public void AddMissing()
    {
        if (_decimals is not null)
        {
            _numbers![_offset + _count] = double.NaN;
            _decimals[_offset + _count] = DataColumn.MissingValue;
        }
        _count++;
    }

    /// <summary>Numbers and per-row markers, the rows before the first value marked missing.</summary>
    private void EnsureNumbers()
    {
        if (_decimals is not null) return;
        _numbers = _store.Numbers;
        _decimals = _store.Decimals;
        _numbers.AsSpan(_offset, _count).Fill(double.NaN);
        _decimals.AsSpan(_offset, _count).Fill(DataColumn.MissingValue);
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
        _text ??= _store.Text;
        _text[_offset + _count] = value;
        if (TextOnly)
        {
            _count++;
            return;
        }
        var number = double.NaN;
        if (_numeric)
        {
            var isNumber = double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out var parsed);
            var problem = UnusableNumber.Problem(value, isNumber, parsed);
            if (isNumber && problem is null)
            {
                number = parsed;
            }
            else if (problem is not null)
            {
                // A broken number (NaN, an overflow, a decimal comma) keeps the column numeric: if every other value is a
                // number, the column is a numeric one with a bad value, reported at its line when the column is built.
                _unusable ??= (value, line, problem);
                _evidence ??= $"'{Shorten(value)}' on line {line}";
            }
            else
            {
                _numeric = false;
                _evidence ??= $"'{Shorten(value)}' on line {line}";
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
            _numbers![_offset + _count] = number;
            _decimals![_offset + _count] = DataColumn.WrittenValue;
        }
        _count++;
    }

    private void Store(double number, sbyte decimals)
    {
        _any = true;
        EnsureNumbers();
        _numbers![_offset + _count] = number;
        _decimals![_offset + _count] = decimals;
        _count++;
    }

    /// <summary>The column of the file <paramref name="path"/> (for the message of an unusable number).</summary>
    public DataColumn Build(string path) => Join([this], path);

    /// <summary>
    /// The column of builders that filled consecutive parts of one file (in file order, sharing one store): typed as
    /// if one builder had read every value (numeric only when every part is, and so on), its rows moved together.
    /// Canonical values a part stored as numbers or dates become their text again where the column turns out to be
    /// text: the same text as written (<see cref="CanonicalText"/>). A numeric column holding a number OutputForge
    /// cannot use (<see cref="UnusableNumber"/>) is a <see cref="DataException"/> at that value's line of
    /// <paramref name="path"/>.
    /// </summary>
    public static DataColumn Join(IReadOnlyList<ColumnBuilder> parts, string path)
    {
        var name = parts[0]._name;
        var store = parts[0]._store;
        var count = parts.Sum(p => p._count);
        if (!parts.Any(p => p._any))
        {
            return new DataColumn(name, VariableKind.Text, new string?[count], null, count);
        }
        var numeric = parts.All(p => p._numeric);
        if (numeric && parts.Select(p => p._unusable).FirstOrDefault(u => u is not null) is { } unusable)
        {
            throw new DataException(path, unusable.Line, name, $"'{Shorten(unusable.Value)}' {unusable.Problem}");
        }
        if (numeric || parts.All(p => p._dates))
        {
            foreach (var part in parts.Where(p => p._decimals is null))
            {
                // This part held missing values only, and another part made the arrays.
                store.Numbers.AsSpan(part._offset, part._count).Fill(double.NaN);
                store.Decimals.AsSpan(part._offset, part._count).Fill(DataColumn.MissingValue);
            }
            var written = store.HasText ? MoveTogether(parts, store.Text) : null;
            return DataColumn.Compact(name, numeric ? VariableKind.Number : VariableKind.Date,
                MoveTogether(parts, store.Numbers), MoveTogether(parts, store.Decimals), written, count);
        }
        // A text column: values read before a part's first text value may have been stored as canonical numbers or dates.
        var text = store.Text;
        foreach (var part in parts.Where(p => p._decimals is not null))
        {
            for (var i = part._offset; i < part._offset + part._count; i++)
            {
                var decimals = part._decimals![i];
                if (decimals >= 0)
                {
                    text[i] = part._canonicalDates ? CanonicalText.FormatDate(part._numbers![i]) : CanonicalText.FormatNumber(part._numbers![i], decimals);
                }
            }
        }
        return new DataColumn(name, VariableKind.Text, MoveTogether(parts, text), null, count)
        {
            TextEvidence = parts.Select(p => p._evidence).FirstOrDefault(e => e is not null),
        };
    }

    /// <summary>Moves each part's rows down to follow the rows of the parts before it (regions may have had room to spare).</summary>
    public static T[] MoveTogether<T>(IReadOnlyList<ColumnBuilder> parts, T[] values)
    {
        var to = 0;
        foreach (var part in parts)
        {
            if (part._offset != to)
            {
                Array.Copy(values, part._offset, values, to, part._count);
            }
            to += part._count;
        }
        return values;
    }

    /// <summary>
    /// Moves the rows of parts that hold <paramref name="counts"/> rows from <paramref name="offsets"/> down to follow each
    /// other (the line of each row, kept apart from any column, since a run may skip every column of some part's kind).
    /// </summary>
    public static T[] MoveRowsTogether<T>(IReadOnlyList<int> counts, IReadOnlyList<int> offsets, T[] values)
    {
        var to = 0;
        for (var p = 0; p < counts.Count; p++)
        {
            if (offsets[p] != to)
            {
                Array.Copy(values, offsets[p], values, to, counts[p]);
            }
            to += counts[p];
        }
        return values;
    }

    private static string Shorten(string value) => value.Length <= 20 ? value : value[..20] + "...";
}
