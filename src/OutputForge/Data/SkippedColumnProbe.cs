using System.Globalization;

namespace OutputForge.Data;

/// <summary>
/// A CSV variable the run skips (<see cref="ColumnProjection"/>): its values are neither stored nor kept as numbers, but
/// the column is typed far enough to find a number OutputForge cannot use (<see cref="UnusableNumber"/>) in a column
/// whose other values are numbers, so that a file is refused alike whatever a run reads of it. A canonical number
/// costs one look at its bytes; only other values are decoded, and none once the column has shown it is text.
/// </summary>
internal sealed class SkippedColumnProbe
{
    private bool _numeric = true;
    private (string Value, int Line, string Problem)? _unusable;

    /// <summary>A non-missing value of the column (<paramref name="text"/> decodes it when needed).</summary>
    public void Add(ReadOnlySpan<byte> utf8, Func<string> text, int line)
    {
        if (!_numeric || CanonicalText.TryParseNumber(utf8, out _, out _))
        {
            return;
        }
        var value = text();
        var isNumber = double.TryParse(value, NumberStyles.Float, CultureInfo.InvariantCulture, out var parsed);
        if (UnusableNumber.Problem(value, isNumber, parsed) is { } problem)
        {
            _unusable ??= (value, line, problem);
        }
        else if (!isNumber)
        {
            _numeric = false;
        }
    }

    /// <summary>The error <see cref="ColumnBuilder.Join"/> would give for the column of these parts (in file order), or null.</summary>
    public static DataException? Problem(IReadOnlyList<SkippedColumnProbe> parts, string path, string name) =>
        parts.All(p => p._numeric) && parts.Select(p => p._unusable).FirstOrDefault(u => u is not null) is { } unusable
            ? new DataException(path, unusable.Line, name, $"'{(unusable.Value.Length <= 20 ? unusable.Value : unusable.Value[..20] + "...")}' {unusable.Problem}")
            : null;
}
