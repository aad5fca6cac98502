using System.Text;
using FsCheck;
using FsCheck.Fluent;
using FsCheck.Xunit;
using OutputForge.Data;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Properties;

/// <summary>Property-based checks of the CSV reader: it never fails with anything but its own error, and it reads back what RFC 4180 writes.</summary>
public sealed class CsvReaderProperties : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private string WriteBytes(byte[] bytes)
    {
        var path = _folder.File(Guid.NewGuid().ToString("N") + ".csv");
        File.WriteAllBytes(path, bytes);
        return path;
    }

    [Property(MaxTest = 400)]
    public void Any_bytes_either_read_or_fail_with_a_data_error(byte[] bytes)
    {
        var path = WriteBytes(bytes);
        try
        {
            var data = CsvDatasetReader.Read("x", path);
            Assert.True(data.RowCount >= 0);
        }
        catch (DataException e)
        {
            Assert.StartsWith(path, e.Message);
            Assert.DoesNotContain('\n', e.Message);
        }
    }

    private static readonly char[] Alphabet = "ab,\"\n\r; xé1".ToCharArray();

    [Property(MaxTest = 400)]
    public void Any_text_made_of_csv_punctuation_reads_or_fails_with_a_data_error(NonNegativeInt seed)
    {
        var random = new Random(seed.Get);
        var text = new string(Enumerable.Range(0, random.Next(0, 60)).Select(_ => Alphabet[random.Next(Alphabet.Length)]).ToArray());
        var path = WriteBytes(Encoding.UTF8.GetBytes("A,B\n" + text));
        try
        {
            CsvDatasetReader.Read("x", path);
        }
        catch (DataException e)
        {
            Assert.Contains(Path.GetFileName(path), e.Message);
        }
    }

    [Property(MaxTest = 200)]
    public Property Values_written_with_rfc4180_quoting_read_back_unchanged_but_for_trailing_blanks()
    {
        var field = Gen.Elements("", "a", "Pain, back", "say \"hi\"", "two\nlines", "  spaced ", "é", "0.5", "=1+1", "x\r\ny")
            .SelectMany(a => Gen.Elements("", "b", ",", "\"").Select(b => a + b));
        var row = Gen.ArrayOf(field, 3);
        var rows = Gen.NonEmptyListOf(row);
        return Prop.ForAll(rows.ToArbitrary(), generated =>
        {
            var text = new StringBuilder("C1,C2,C3\n");
            foreach (var r in generated)
            {
                text.Append(string.Join(",", r.Select(Quote))).Append('\n');
            }
            var data = CsvDatasetReader.Read("x", WriteBytes(Encoding.UTF8.GetBytes(text.ToString())));
            // An all-empty row reads as one empty record per field; a lone empty field in a one-column file would be a blank line.
            var expected = generated.ToList();
            Assert.Equal(expected.Count, data.RowCount);
            for (var i = 0; i < expected.Count; i++)
            {
                for (var c = 0; c < 3; c++)
                {
                    var value = data.Columns[c].GetText(i);
                    // Trailing blanks are transport padding, dropped when read; blanks only are a missing value.
                    var written = expected[i][c].TrimEnd(' ');
                    Assert.Equal(written.Length == 0 ? null : written, value);
                }
            }
        });
    }

    private static string Quote(string value) =>
        value.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? "\"" + value.Replace("\"", "\"\"") + "\"" : value;
}
