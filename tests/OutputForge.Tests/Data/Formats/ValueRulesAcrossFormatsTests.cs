using System.Text;
using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;
using OutputForge.Expressions;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Data.Formats;

/// <summary>
/// The rules for values hold for XPT and Dataset-JSON (JSON and NDJSON) as for CSV (TrailingBlankTests,
/// UnusableNumberTests, CsvDatasetReaderTests): trailing blanks are dropped and a value of blanks only is missing, so a
/// USUBJID padded in one dataset and not in another is one subject; a number that is NaN, infinite or beyond 1e100 in
/// magnitude is an error naming the file, row, variable and value; a control character, a noncharacter or a lone
/// surrogate is refused at its row and variable, or replaced by U+FFFD with a warning under
/// <c>--control-characters replace</c>; a value longer than a table cell holds is refused.
/// </summary>
public sealed class ValueRulesAcrossFormatsTests : IDisposable
{
    private static readonly DateTime Created = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    private static readonly DataReadOptions Replace = new(ControlCharacterPolicy.Replace);

    private readonly TempFolder _folder = new();

    public void Dispose() => _folder.Dispose();

    /// <summary>A Dataset-JSON 1.1 file (or NDJSON) of the columns (name and dataType) and rows given as JSON text.</summary>
    private string Json(string file, (string Name, string Type)[] columns, params string[] rows)
    {
        var metadata = "\"datasetJSONVersion\":\"1.1.0\",\"records\":" + rows.Length + ",\"columns\":["
            + string.Join(",", columns.Select(c => $"{{\"itemOID\":\"IT.{c.Name}\",\"name\":\"{c.Name}\",\"label\":\"{c.Name}\",\"dataType\":\"{c.Type}\"}}")) + "]";
        var path = _folder.File(file);
        var text = file.EndsWith(".ndjson", StringComparison.Ordinal)
            ? "{" + metadata + "}\n" + string.Concat(rows.Select(r => "[" + r + "]\n"))
            : "{" + metadata + ",\"rows\":[" + string.Join(",", rows.Select(r => "[" + r + "]")) + "]}";
        File.WriteAllBytes(path, Encoding.UTF8.GetBytes(text));
        return path;
    }

    private static readonly (string, string)[] SubjectAndTerm = [("USUBJID", "string"), ("TERM", "string")];

    private static Dataset ReadJson(string path, DataReadOptions? options = null, List<string>? warnings = null) =>
        DatasetJsonReader.Read("adae", path, options ?? DataReadOptions.Default, w => warnings?.Add(w));

    /// <summary>
    /// An XPT file of the CSV's data (the repository's writer), with the ASCII <paramref name="placeholder"/> in the
    /// observations replaced by <paramref name="bytes"/> of the same length: the bytes no CSV value could carry there.
    /// </summary>
    private string Xpt(string csv, string placeholder = "", byte[]? bytes = null)
    {
        var path = _folder.File("adae.xpt");
        XptDatasetWriter.Write(CsvDatasetReader.Read("adae", _folder.Write("adae-source.csv", csv)), path, Created);
        if (bytes is not null)
        {
            var content = File.ReadAllBytes(path);
            var at = content.AsSpan().LastIndexOf(Encoding.ASCII.GetBytes(placeholder));
            Assert.True(at > 0 && bytes.Length == placeholder.Length);
            bytes.CopyTo(content, at);
            File.WriteAllBytes(path, content);
        }
        return path;
    }

    // Trailing blanks and blank-only values

    [Theory]
    [InlineData("adae.json")]
    [InlineData("adae.ndjson")]
    public void Dataset_json_text_is_read_without_trailing_blanks_and_blanks_only_is_missing(string file)
    {
        var data = ReadJson(Json(file, [("USUBJID", "string"), ("TERM", "string"), ("ASTDT", "date"), ("AVAL", "decimal")],
            "\"S1  \",\" a b \",\"2024-01-05 \",\"1.50 \"",
            "\"S2\",\"   \",\"2024-01-06\",\"  \""));
        Assert.Equal("S1", data.Get("USUBJID").GetText(0));
        Assert.Equal(" a b", data.Get("TERM").GetText(0));
        Assert.True(data.Get("TERM").IsMissing(1));
        Assert.Equal(VariableKind.Date, data.Get("ASTDT").Kind);
        Assert.Equal("2024-01-05", data.Get("ASTDT").GetText(0));
        Assert.Equal(VariableKind.Number, data.Get("AVAL").Kind);
        Assert.Equal("1.50", data.Get("AVAL").GetText(0));
        Assert.True(data.Get("AVAL").IsMissing(1));
    }

    [Fact]
    public void Dataset_json_text_with_escapes_is_read_without_trailing_blanks()
    {
        var data = ReadJson(Json("adae.json", SubjectAndTerm, "\"S\\u0031 \",\"Head\\u0061che\\t \"", "\"S2\",\"\\u0020\\u0020\""));
        Assert.Equal("S1", data.Get("USUBJID").GetText(0));
        Assert.Equal("Headache\t", data.Get("TERM").GetText(0));
        Assert.True(data.Get("TERM").IsMissing(1));
    }

    [Fact]
    public void Xpt_character_values_are_read_without_their_padding_and_blanks_only_is_missing()
    {
        // The writer pads every value to the variable's length (here 5 bytes), as transport files do.
        var data = XptDatasetReader.Read("adae", Xpt("USUBJID,TERM\nS1,Nausea\nS2222,\n"));
        Assert.Equal("S1", data.Get("USUBJID").GetText(0));
        Assert.Equal("Nausea", data.Get("TERM").GetText(0));
        Assert.True(data.Get("TERM").IsMissing(1));
    }

    [Fact]
    public void A_subject_id_padded_in_one_format_and_not_in_another_is_the_same_subject()
    {
        var adsl = XptDatasetReader.Read("adsl", Xpt("USUBJID,ITTFL\nS1,Y\nS222,Y\n"));
        var adae = ReadJson(Json("adae.json", SubjectAndTerm, "\"S1   \",\"Nausea\"", "\"S222\",\"Headache\""));
        var adeff = CsvDatasetReader.Read("adeff", _folder.Write("adeff.csv", "USUBJID,PARAMCD\nS1 ,X\nS222  ,X\n"));
        AdamConformance.CheckAgainstSubjectLevel(adae, adsl);
        AdamConformance.CheckAgainstSubjectLevel(adeff, adsl);
        var jsonAdsl = DatasetJsonReader.Read("adsl", Json("adsl.json", [("USUBJID", "string"), ("ITTFL", "string")], "\"S1\",\"Y\"", "\"S1 \",\"Y\""));
        var error = Assert.Throws<DataException>(() => AdamConformance.CheckSubjectLevel(jsonAdsl));
        Assert.Contains("subject S1 has a second ADSL row", error.Message);
    }

    // Numbers no statistic can use

    [Theory]
    [InlineData("1e400", "'1e400' overflows: it is beyond the double range")]
    [InlineData("-1e400", "'-1e400' overflows")]
    [InlineData("1e300", "'1e300' is beyond 1e100 in magnitude")]
    [InlineData("-2.5e101", "'-2.5e101' is beyond 1e100 in magnitude")]
    [InlineData("\"1e300\"", "'1e300' is beyond 1e100 in magnitude")]
    [InlineData("\"1E400\"", "'1E400' overflows")]
    [InlineData("\"NaN\"", "'NaN' is not a number (leave a missing value empty; NaN is refused)")]
    [InlineData("\"Infinity\"", "'Infinity' is infinite")]
    [InlineData("\"-Infinity \"", "'-Infinity' is infinite")]
    [InlineData("\"1,5\"", "'1,5' is not a number: write numbers with a decimal point")]
    public void A_dataset_json_number_no_statistic_can_use_is_an_error_naming_row_variable_and_value(string value, string expected)
    {
        foreach (var file in new[] { "adeff.json", "adeff.ndjson" })
        {
            var path = Json(file, [("USUBJID", "string"), ("AVAL", "decimal")], "\"S1\",\"1.5\"", "\"S2\",2", $"\"S3\",{value}", "\"S4\",4");
            var error = Assert.Throws<DataException>(() => ReadJson(path));
            Assert.StartsWith($"{path}: row 3, column AVAL: {expected}", error.Message);
        }
    }

    [Fact]
    public void A_dataset_json_float_or_integer_column_holds_the_same_rule()
    {
        var floats = Json("adeff.json", [("USUBJID", "string"), ("AVAL", "double")], "\"S1\",1.5", "\"S2\",1e300");
        Assert.Contains("row 2, column AVAL: '1e300' is beyond 1e100 in magnitude", Assert.Throws<DataException>(() => ReadJson(floats)).Message);
        var integers = Json("adsl.json", [("USUBJID", "string"), ("AGE", "integer")], "\"S1\",40", "\"S2\",1e400");
        Assert.Contains("row 2, column AGE: '1e400' overflows", Assert.Throws<DataException>(() => ReadJson(integers)).Message);
    }

    [Theory]
    [InlineData("1e100")]
    [InlineData("-1e100")]
    [InlineData("\"1e100\"")]
    [InlineData("1e-300")]
    [InlineData("\"1.5E3\"")]
    public void Dataset_json_numbers_up_to_1e100_in_magnitude_are_read(string value)
    {
        var data = ReadJson(Json("adeff.json", [("USUBJID", "string"), ("AVAL", "decimal")], "\"S1\",1", $"\"S2\",{value}"));
        Assert.Equal(double.Parse(value.Trim('"'), System.Globalization.CultureInfo.InvariantCulture), data.Get("AVAL").GetNumber(1));
    }

    [Fact]
    public void Every_xpt_number_is_finite_and_within_1e100_so_none_needs_refusing()
    {
        // IBM hexadecimal floating point has no NaN or infinity; its largest magnitude is (1 - 16^-14) x 16^63, about
        // 7.2e75 (IBM System/370 Principles of Operation, "Floating-Point Data Format"). Every first byte (sign and
        // exponent) with the largest and the smallest non-zero fraction is either one of the 28 missing values or a
        // finite number within the 1e100 OutputForge reads.
        for (var first = 0; first < 256; first++)
        {
            foreach (var fraction in new byte[] { 0xFF, 0x01 })
            {
                var bytes = new byte[8];
                bytes[0] = (byte)first;
                bytes.AsSpan(1).Fill(fraction);
                var value = IbmFloat.ToDouble(bytes);
                Assert.True(UnusableNumber.IsUsable(value), $"first byte {first:X2}, fraction {fraction:X2}: {value}");
                Assert.True(Math.Abs(value) < 7.3e75);
            }
        }
        Assert.Equal(7.237e75, IbmFloat.ToDouble([0x7F, 0xFF, 0xFF, 0xFF, 0xFF, 0xFF, 0xFF, 0xFF]), 0.001e75);
    }

    // Control characters, noncharacters, lone surrogates

    [Theory]
    [InlineData("\"Na\\u0001usea\"", "the control character U+0001 at character 3")]
    [InlineData("\"Nausea\\ufffe\"", "the noncharacter U+FFFE at character 7")]
    [InlineData("\"Na\\ud800usea\"", "a lone UTF-16 surrogate U+D800 (half of a character) at character 3")]
    [InlineData("\"Nausea\\udc00\"", "a lone UTF-16 surrogate U+DC00 (half of a character) at character 7")]
    [InlineData("\"Nausea\uFFFE\"", "the noncharacter U+FFFE at character 7")]
    [InlineData("\"Nausea\uFDD0 \"", "the noncharacter U+FDD0 at character 7")]
    [InlineData("\"Nausea\U0010FFFF\"", "the noncharacter U+10FFFF at character 7")]
    public void A_dataset_json_value_a_document_cannot_hold_is_refused_at_its_row_and_column(string value, string expected)
    {
        foreach (var file in new[] { "adae.json", "adae.ndjson" })
        {
            var path = Json(file, SubjectAndTerm, "\"S1\",\"Headache\"", $"\"S2\",{value}");
            var error = Assert.Throws<DataException>(() => ReadJson(path));
            Assert.Equal($"{path}: row 2, column TERM: the value holds {expected}, which Word and Excel cannot store; clean the data, or run with --control-characters replace", error.Message);
        }
    }

    [Fact]
    public void With_replace_a_dataset_json_value_keeps_a_marker_for_each_forbidden_character_and_a_warning_counts_them()
    {
        var path = Json("adae.json", SubjectAndTerm,
            "\"S1\",\"Na\\u0001usea\"", "\"S2\",\"Head\\ud800ache\"", "\"S3\",\"Rash\uFFFE\"", "\"S4\",\"Cough\"", "\"S5\",\"\\udbff\\udfff\"");
        var warnings = new List<string>();
        var data = ReadJson(path, Replace, warnings);
        Assert.Equal(["Na\uFFFDusea", "Head\uFFFDache", "Rash\uFFFD", "Cough", "\uFFFD"], Enumerable.Range(0, 5).Select(r => data.Get("TERM").GetText(r)));
        Assert.Equal([$"{path}: 4 values held control characters, replaced by U+FFFD"], warnings);
    }

    [Theory]
    [InlineData(new byte[] { 0xED, 0xA0, 0x80 })]
    [InlineData(new byte[] { (byte)'N', 0xE9, (byte)'e' })]
    public void A_dataset_json_value_that_is_not_utf8_is_refused_not_decoded_to_markers(byte[] bytes)
    {
        // A raw surrogate (ED A0 80) and a Latin-1 letter are invalid UTF-8, with or without escapes in the same value.
        foreach (var value in new[] { "\"Na~~~\"", "\"\\tNa~~~\"" })
        {
            var path = Json("adae.json", SubjectAndTerm, "\"S1\",\"Rash\"", $"\"S2\",{value}");
            var content = File.ReadAllBytes(path);
            bytes.CopyTo(content, content.AsSpan().IndexOf("~~~"u8));
            File.WriteAllBytes(path, content);
            foreach (var options in new[] { DataReadOptions.Default, Replace })
            {
                var error = Assert.Throws<DataException>(() => ReadJson(path, options));
                Assert.Equal($"{path}: row 2, column TERM: the value is not valid UTF-8 (Latin-1 or another encoding?); Dataset-JSON files are UTF-8", error.Message);
            }
        }
    }

    [Fact]
    public void A_dataset_json_label_with_a_lone_surrogate_escape_is_a_located_error()
    {
        var path = Json("adae.json", SubjectAndTerm, "\"S1\",\"Rash\"");
        File.WriteAllText(path, File.ReadAllText(path).Replace("\"label\":\"TERM\"", "\"label\":\"T\\ud800\""));
        var error = Assert.Throws<DataException>(() => ReadJson(path));
        Assert.Equal($"{path}: in columns[1]: a text is not valid UTF-8 or holds a lone UTF-16 surrogate escape (such as \\ud800 without its pair); Dataset-JSON files are UTF-8", error.Message);
    }

    [Fact]
    public void A_dataset_json_value_longer_than_a_table_cell_is_refused()
    {
        var path = Json("adae.json", SubjectAndTerm, "\"S1\",\"Headache\"", $"\"S2\",\"{new string('x', 40_000)}\"");
        var error = Assert.Throws<DataException>(() => ReadJson(path));
        Assert.Equal($"{path}: row 2, column TERM: the text is 40,000 characters long, more than the 32,767 one table cell can hold (the same limit in every format)", error.Message);
        var escaped = Json("adae.ndjson", SubjectAndTerm, $"\"S1\",\"\\t{new string('x', 32_767)}\"");
        Assert.Contains("row 1, column TERM: the text is 32,768 characters long", Assert.Throws<DataException>(() => ReadJson(escaped)).Message);
        var longest = ReadJson(Json("adae.json", SubjectAndTerm, $"\"S1\",\"{new string('x', 32_767)}   \""));
        Assert.Equal(32_767, longest.Get("TERM").GetText(0)!.Length);
    }

    [Theory]
    [InlineData(new byte[] { 0x01, (byte)'x', (byte)'x' }, "the control character U+0001 at character 3")]
    [InlineData(new byte[] { 0xEF, 0xBF, 0xBE }, "the noncharacter U+FFFE at character 3")]
    [InlineData(new byte[] { 0xEF, 0xB7, 0x90 }, "the noncharacter U+FDD0 at character 3")]
    public void An_xpt_value_a_document_cannot_hold_is_refused_at_its_row_and_variable(byte[] bytes, string expected)
    {
        var path = Xpt("USUBJID,TERM\nS1,Headache\nS2,Na~~~\n", "~~~", bytes);
        var error = Assert.Throws<DataException>(() => XptDatasetReader.Read("adae", path));
        Assert.Equal($"{path}, variable TERM: row 2: the value holds {expected}, which Word and Excel cannot store; clean the data, or run with --control-characters replace", error.Message);
    }

    [Fact]
    public void With_replace_an_xpt_value_keeps_a_marker_for_each_forbidden_character_and_a_warning_counts_them()
    {
        var path = Xpt("USUBJID,TERM\nS1,Headache\nS2,Na~~~\n", "~~~", [0xEF, 0xBF, 0xBE]);
        var warnings = new List<string>();
        var data = XptDatasetReader.Read("adae", path, Replace, warnings.Add);
        Assert.Equal("Na\uFFFD", data.Get("TERM").GetText(1));
        Assert.Equal([$"{path}: 1 value held control characters, replaced by U+FFFD"], warnings);
    }
}
