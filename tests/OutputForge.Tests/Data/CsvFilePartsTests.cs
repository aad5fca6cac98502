using System.Text;
using FsCheck;
using FsCheck.Xunit;
using OutputForge.Data;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data;

/// <summary>
/// A file read in parts on several cores must give the dataset, the warnings and the errors that one reader going
/// through it from the start gives. The files here are small, so they are cut into parts of a few bytes: every cut
/// falls somewhere, inside quoted values with line breaks too, and the parts' types differ from part to part.
/// </summary>
public sealed class CsvFilePartsTests : IDisposable
{
    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    private static readonly int[] PartSizes = [1, 7, 16, 40, 100];

    /// <summary>The file read in parts of <paramref name="partBytes"/>: its dataset and warnings, or its error's message.</summary>
    private static (Dataset? Data, List<string> Warnings, string? Error, int Parts) InParts(string path, int partBytes, DataReadOptions options)
    {
        var warnings = new List<string>();
        try
        {
            var file = CsvFileParts.Open("adeff", path, options, partBytes);
            // The parts in reverse order and on several threads: no part may depend on another having been read.
            Parallel.For(0, file.Count, p => file.Read(file.Count - 1 - p));
            return (file.Finish(warnings.Add), warnings, null, file.Count);
        }
        catch (DataException e)
        {
            return (null, warnings, e.Message, 0);
        }
    }

    private static (Dataset? Data, List<string> Warnings, string? Error) Whole(string path, DataReadOptions options)
    {
        var warnings = new List<string>();
        try
        {
            // Below 64 MB the reader reads a file whole, on one thread.
            return (CsvDatasetReader.Read("adeff", path, options, warnings.Add), warnings, null);
        }
        catch (DataException e)
        {
            return (null, warnings, e.Message);
        }
    }

    private void SameInPartsAsWhole(string content, DataReadOptions? options = null, bool expectParts = true)
    {
        options ??= DataReadOptions.Default;
        var path = _folder.Write("adeff.csv", content);
        var whole = Whole(path, options);
        foreach (var size in PartSizes)
        {
            var parts = InParts(path, size, options);
            Assert.Equal(whole.Error, parts.Error);
            Assert.Equal(whole.Warnings, parts.Warnings);
            if (whole.Data is not null)
            {
                AssertSame(whole.Data, parts.Data!);
                if (expectParts && Environment.ProcessorCount > 1 && size <= 16)
                {
                    Assert.True(parts.Parts > 1, $"parts of {size} bytes: the file was read whole");
                }
            }
        }
    }

    private static void AssertSame(Dataset expected, Dataset actual)
    {
        Assert.Equal(expected.RowCount, actual.RowCount);
        Assert.Equal(expected.LineOfRow, actual.LineOfRow);
        Assert.Equal(expected.ContentSha256, actual.ContentSha256);
        Assert.Equal(expected.Columns.Select(c => c.Name), actual.Columns.Select(c => c.Name));
        foreach (var (e, a) in expected.Columns.Zip(actual.Columns))
        {
            Assert.Equal(e.Kind, a.Kind);
            Assert.Equal(e.Length, a.Length);
            Assert.Equal(e.TextEvidence, a.TextEvidence);
            for (var row = 0; row < e.Length; row++)
            {
                Assert.Equal(e.IsMissing(row), a.IsMissing(row));
                Assert.Equal(e.GetText(row), a.GetText(row));
                Assert.Equal(BitConverter.DoubleToInt64Bits(e.GetNumber(row)), BitConverter.DoubleToInt64Bits(a.GetNumber(row)));
            }
        }
    }

    [Fact]
    public void A_typical_file_reads_the_same_in_parts()
    {
        SameInPartsAsWhole(
            "USUBJID,PARAMCD,AVISIT,ADT,AVAL,CHG,AVALC,DTYPE\n" +
            "S1,ITCH,Baseline,2026-01-10,6.5,,6.5,\n" +
            "S1,ITCH,Week 1,2026-01-17,5,-1.5,5,\n" +
            "S1,ITCH,Week 2,2026-01-24,4.25,-2.25,4.25,LOCF\n" +
            "S2,ITCH,Baseline,2026-01-11,7,,\"seven, as said\",\n" +
            "S2,ITCH,Week 1,,1e3,0,x,\n" +
            "S2,ITCH,Week 2,2026-01-25,0.10,-6.90,0.10,\n");
    }

    [Fact]
    public void Types_that_change_from_part_to_part_join_as_one_reader_types_them()
    {
        // NUM turns to text on line 7 (a late part), DAT from dates to text on line 6, LATE holds only missing values
        // before its numbers, EARLY numbers before only missing values, MIX dates early and numbers late.
        SameInPartsAsWhole(
            "USUBJID,NUM,DAT,LATE,EARLY,MIX\n" +
            "S1,1,2026-01-01,,1.5,2026-02-01\n" +
            "S2,2.50,2026-01-02,,2,2026-02-02\n" +
            "S3,3,2026-01-03,,,\n" +
            "S4,4,2026-01-04,4,,\n" +
            "S5,5,soon,5.0,,7\n" +
            "S6,n/a,2026-01-06,6,,8.25\n" +
            "S7,-0,2026-13-01,1E5,,0009\n");
    }

    [Fact]
    public void Quoted_line_breaks_blank_lines_and_every_kind_of_line_ending_read_the_same_in_parts()
    {
        SameInPartsAsWhole(
            "USUBJID,TERM,AVAL\r\n" +
            "S1,\"two\nlines\",1\r\n" +
            "S2,\"three\r\nlines\rhere\",2\n" +
            "\n" +
            "S3,plain,3\r" +
            "S4,\"a \"\"quoted\"\" word\",4\r\n" +
            "\r\n" +
            "S5,\"ends with a break\n\",5");
    }

    [Fact]
    public void A_byte_order_mark_and_a_missing_last_line_break_read_the_same_in_parts()
    {
        SameInPartsAsWhole("\uFEFFUSUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,4");
    }

    [Fact]
    public void Replaced_control_characters_are_counted_once_for_the_whole_file()
    {
        SameInPartsAsWhole("USUBJID,TERM\nS1,a\u0007b\nS2,ok\nS3,c\u0001d\nS4,e\u0002\n", new DataReadOptions(ControlCharacterPolicy.Replace));
    }

    [Theory]
    [InlineData("USUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,4,5\nS5,5\n")]
    [InlineData("USUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,\"4\nS5,5\n")]
    [InlineData("USUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,4\u0000\nS5,5\n")]
    [InlineData("USUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,a\u0007b\nS5,5\n")]
    [InlineData("USUBJID,AVAL\nS1,1\nS2,2\nS3,3\nS4,4\nS5,5 \"x\"\n")]
    public void A_problem_late_in_the_file_is_reported_as_a_reader_from_the_start_reports_it(string content)
    {
        SameInPartsAsWhole(content);
    }

    [Fact]
    public void Bytes_that_are_not_utf8_late_in_the_file_are_reported_at_their_line()
    {
        var path = _folder.File("adeff.csv");
        File.WriteAllBytes(path, [.. "USUBJID,TERM\nS1,a\nS2,b\nS3,c\nS4,"u8, 0xE9, .. "t\u00E9\nS5,e\n"u8]);
        var whole = Whole(path, DataReadOptions.Default);
        Assert.Contains("line 5", whole.Error);
        foreach (var size in PartSizes)
        {
            Assert.Equal(whole.Error, InParts(path, size, DataReadOptions.Default).Error);
        }
    }

    [Fact]
    public void Random_files_read_the_same_in_parts()
    {
        // Seeded, so a failure can be replayed: values of every type, quotes, line breaks inside quotes, blank lines,
        // the three line endings, and now and then a value that changes the column's type.
        var random = new Random(20261202);
        string[] pieces = ["1", "2.5", "-0.125", "1e3", "007", "2026-03-04", "2026-02-30", "", "", "x", "Pain, back",
            "two\nlines", "say \"hi\"", " spaced ", "NA", "3.0", "12345678901234567"];
        for (var file = 0; file < 60; file++)
        {
            var columns = random.Next(1, 5);
            var text = new StringBuilder(string.Join(",", Enumerable.Range(0, columns).Select(c => $"V{c}")));
            var rows = random.Next(0, 25);
            var types = Enumerable.Range(0, columns).Select(_ => random.Next(3)).ToArray();
            for (var row = 0; row < rows; row++)
            {
                text.Append(random.Next(3) switch { 0 => "\n", 1 => "\r\n", _ => "\r" });
                if (random.Next(12) == 0)
                {
                    text.Append(random.Next(2) == 0 ? "\n" : "\r\n");
                }
                var values = Enumerable.Range(0, columns).Select(c =>
                {
                    var value = random.Next(8) == 0
                        ? pieces[random.Next(pieces.Length)]
                        : types[c] switch { 0 => random.Next(100).ToString(System.Globalization.CultureInfo.InvariantCulture), 1 => $"2026-01-{random.Next(1, 29):00}", _ => $"t{random.Next(5)}" };
                    return value.IndexOfAny([',', '"', '\n', '\r']) >= 0 ? $"\"{value.Replace("\"", "\"\"", StringComparison.Ordinal)}\"" : value;
                });
                text.Append(string.Join(",", values));
            }
            if (random.Next(2) == 0)
            {
                text.Append('\n');
            }
            SameInPartsAsWhole(text.ToString(), expectParts: false);
        }
    }

    private static readonly char[] Alphabet = "ab,\"\n\r; x\u00E91-.\u0007".ToCharArray();

    /// <summary>Any text of CSV punctuation, cut into parts of any size: the same dataset, warnings or error as read whole.</summary>
    [Property(MaxTest = 300)]
    public void Any_text_reads_the_same_in_parts_of_any_size(NonNegativeInt seed, PositiveInt partBytes)
    {
        var random = new Random(seed.Get);
        var text = new string(Enumerable.Range(0, random.Next(0, 80)).Select(_ => Alphabet[random.Next(Alphabet.Length)]).ToArray());
        var path = _folder.Write($"p{Guid.NewGuid():N}.csv", "A,B\n" + text);
        var options = new DataReadOptions(random.Next(2) == 0 ? ControlCharacterPolicy.Refuse : ControlCharacterPolicy.Replace);
        var whole = Whole(path, options);
        var parts = InParts(path, 1 + partBytes.Get % 24, options);
        Assert.Equal(whole.Error, parts.Error);
        Assert.Equal(whole.Warnings, parts.Warnings);
        if (whole.Data is not null)
        {
            AssertSame(whole.Data, parts.Data!);
        }
    }

    [Fact]
    public void Carriage_returns_alone_end_lines_and_rows()
    {
        var path = _folder.Write("adsl.csv", "USUBJID,AGE\rS1,30\rS2,31\rS3,32\rS4,33\rS5,34\r");
        var data = CsvDatasetReader.Read("adsl", path);
        Assert.Equal(5, data.RowCount);
        Assert.Equal([2, 3, 4, 5, 6], data.LineOfRow);
        Assert.Equal(34, data.Get("AGE").GetNumber(4));
    }
}
