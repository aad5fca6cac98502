using System.Globalization;

namespace OutputForge.Stats.Descriptive;

/// <summary>
/// A double taken as the shortest decimal that round-trips to it (the number as written in the data),
/// for the exact decimal sums and quantiles. Data columns repeat few distinct values (ages, visits,
/// values recorded to one decimal), so each conversion of a sample remembers the values it has already
/// converted by their bit pattern and formats and parses each distinct value only once; the decimal
/// returned for a repeated value is the very same one.
/// </summary>
internal sealed class RoundTripDecimal
{
    private readonly Dictionary<long, decimal> _converted = [];

    public decimal Of(double value)
    {
        var bits = BitConverter.DoubleToInt64Bits(value);
        if (_converted.TryGetValue(bits, out var known))
        {
            return known;
        }
        Span<char> text = stackalloc char[32];
        if (!value.TryFormat(text, out var length, "R", CultureInfo.InvariantCulture))
        {
            throw new InvalidOperationException($"the value {value} does not fit its round-trip text buffer");
        }
        var converted = decimal.Parse(text[..length], NumberStyles.Float, CultureInfo.InvariantCulture);
        _converted[bits] = converted;
        return converted;
    }
}
