using System.Globalization;
using System.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using OutputForge.Data;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Properties;

/// <summary>
/// The reader's typed columns (numbers and dates held without their text when it can be rebuilt) give exactly
/// what the plain rule gives: a column is numeric when every non-missing value parses as an invariant-culture
/// finite number of magnitude at most 1e100, a date when every non-missing value is YYYY-MM-DD, text otherwise; a
/// column whose every value parses as a number but some are not finite or beyond 1e100 is an error at the first such
/// line; every value's text reads back as written, without trailing blanks, and every number equals double.Parse of
/// the text, bit for bit.
/// </summary>
public sealed class CsvTypingEquivalenceProperties : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private static readonly string[] Tricky =
    [
        "", "0", "-0", "0.0", "-0.0", "00", "007", "1e3", "1E-2", "+3", ".5", "5.", " 5", "5 ", "-", ".", "1.2.3",
        "123456789012345", "1234567890123456", "0.123456789012345", "-99999.99999", "9007199254740993",
        "2025-02-10", "2025-02-29", "2024-02-29", "0000-01-01", "2025-13-01", "2025-1-01", "20250210", "NaN", "Infinity", "x",
    ];

    private static Gen<string> Value() =>
        Gen.OneOf(
            Gen.Elements(Tricky),
            Gen.Choose(-100000, 100000).SelectMany(m => Gen.Choose(0, 4).Select(d =>
                (m / Math.Pow(10, d)).ToString("F" + d.ToString(CultureInfo.InvariantCulture), CultureInfo.InvariantCulture))),
            Gen.Choose(0, 20000).Select(days => new DateOnly(2020, 1, 1).AddDays(days).ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)));

    /// <summary>Columns of one kind of value each (numbers, dates or anything), so that numeric and date columns come up often.</summary>
    private static Gen<string[]> Column(int rows) =>
        Gen.OneOf(
            Gen.ArrayOf(Gen.OneOf(Gen.Elements(Tricky.Take(22).ToArray()), Value()), rows),
            Gen.ArrayOf(Gen.Choose(0, 9000).Select(d => d == 0 ? "" : new DateOnly(2001, 1, 1).AddDays(d).ToString("yyyy-MM-dd", CultureInfo.InvariantCulture)), rows),
            Gen.ArrayOf(Gen.Choose(-5000, 5000).Select(m => m == 0 ? "" : (m / 10.0).ToString("F1", CultureInfo.InvariantCulture)), rows),
            Gen.ArrayOf(Value(), rows));

    [Property(MaxTest = 300)]
    public Property Typed_columns_equal_the_plain_typing_rule()
    {
        var table = Gen.Choose(1, 12).SelectMany(rows => Gen.ArrayOf(Column(rows), 3));
        return Prop.ForAll(table.ToArbitrary(), columns =>
        {
            var rows = columns[0].Length;
            var text = new StringBuilder("A,B,C\n");
            for (var r = 0; r < rows; r++)
            {
                text.Append(string.Join(",", columns.Select(c => c[r]))).Append('\n');
            }
            var path = _folder.File(Guid.NewGuid().ToString("N") + ".csv");
            File.WriteAllBytes(path, Encoding.UTF8.GetBytes(text.ToString()));
            // "." alone is missing, as an empty field; trailing blanks are dropped, and blanks only are missing.
            var written = columns.Select(c => c.Select(v => v == "." ? "" : v.TrimEnd(' ')).Select(v => v.Length == 0 ? null : v).ToArray()).ToArray();
            if (written.Select(FirstUnusableRow).Where(r => r >= 0).DefaultIfEmpty(-1).Min() is var unusable && unusable >= 0)
            {
                var error = Assert.Throws<DataException>(() => CsvDatasetReader.Read("x", path));
                Assert.Equal(unusable + 2, error.Line);
                return;
            }
            var data = CsvDatasetReader.Read("x", path);
            // Rows of three empty fields are records too (the header has three columns).
            Assert.Equal(rows, data.RowCount);
            for (var c = 0; c < 3; c++)
            {
                var column = data.Columns[c];
                var values = written[c];
                Assert.Equal(PlainKind(values), column.Kind);
                for (var r = 0; r < rows; r++)
                {
                    Assert.Equal(values[r], column.GetText(r));
                    Assert.Equal(values[r] is null, column.IsMissing(r));
                    var expected = values[r] is null || column.Kind == VariableKind.Text ? double.NaN
                        : column.Kind == VariableKind.Date ? DateOnly.ParseExact(values[r]!, "yyyy-MM-dd", CultureInfo.InvariantCulture).DayNumber
                        : double.Parse(values[r]!, NumberStyles.Float, CultureInfo.InvariantCulture);
                    Assert.Equal(BitConverter.DoubleToInt64Bits(expected), BitConverter.DoubleToInt64Bits(column.GetNumber(r)));
                }
            }
        });
    }

    private static bool Usable(double number) => double.IsFinite(number) && Math.Abs(number) <= 1e100;

    /// <summary>
    /// In a column whose every value parses as a number, the first row holding one that is not finite or beyond 1e100
    /// (docs/conditions.md, "Types"); -1 when there is none or the column holds other text.
    /// </summary>
    private static int FirstUnusableRow(string?[] values)
    {
        var parsed = values.Select(v => v is null ? (Parsed: true, Number: 0.0)
            : (Parsed: double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var d), Number: d)).ToList();
        if (!parsed.All(p => p.Parsed)) return -1;
        return parsed.FindIndex(p => !Usable(p.Number));
    }

    /// <summary>The typing rule stated plainly, value by value (docs/conditions.md, "Types").</summary>
    private static VariableKind PlainKind(string?[] values)
    {
        var present = values.OfType<string>().ToList();
        if (present.Count == 0) return VariableKind.Text;
        if (present.All(v => double.TryParse(v, NumberStyles.Float, CultureInfo.InvariantCulture, out var d) && Usable(d)))
            return VariableKind.Number;
        if (present.All(v => v.Length == 10 && DateOnly.TryParseExact(v, "yyyy-MM-dd", CultureInfo.InvariantCulture, DateTimeStyles.None, out _)))
            return VariableKind.Date;
        return VariableKind.Text;
    }
}
