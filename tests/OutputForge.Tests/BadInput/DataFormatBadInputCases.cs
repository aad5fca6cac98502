using System.Text;
using OutputForge.Data;
using OutputForge.Data.DatasetJson;
using OutputForge.Data.Xpt;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.BadInput;

/// <summary>
/// The battery's section on XPT and Dataset-JSON data: the mini study's ADSL written in the format, then damaged.
/// Each error names the file and the record or row.
/// </summary>
public static class DataFormatBadInputCases
{
    private static readonly DateTime Created = new(2026, 1, 1, 0, 0, 0, DateTimeKind.Utc);

    /// <summary>The mini study's ADSL in <paramref name="extension"/> (xpt, json or ndjson).</summary>
    private static byte[] Adsl(string extension)
    {
        using var temp = new TempFolder();
        var dataset = CsvDatasetReader.Read("adsl", temp.Write("adsl.csv", MiniStudy.Adsl));
        var path = temp.File("adsl." + extension);
        if (extension == "xpt") XptDatasetWriter.Write(dataset, path, Created);
        else DatasetJsonWriter.Write(dataset, path, Created, ndjson: extension == "ndjson");
        return File.ReadAllBytes(path);
    }

    private static BadInputCase Case(string name, string extension, Func<byte[], byte[]> damage, params string[] expect) =>
        new(name, [$"adsl.{extension}", .. expect])
        {
            Study = [("\"adsl\": \"adsl.csv\"", $"\"adsl\": \"adsl.{extension}\"")],
            Prepare = study => File.WriteAllBytes(Path.Combine(study.DataFolder, "adsl." + extension), damage(Adsl(extension))),
        };

    private static BadInputCase JsonCase(string name, string extension, string from, string to, params string[] expect) =>
        Case(name, extension, bytes =>
        {
            var text = Encoding.UTF8.GetString(bytes);
            if (!text.Contains(from, StringComparison.Ordinal)) throw new InvalidOperationException($"case '{name}': '{from}' is not in the file");
            var at = text.IndexOf(from, StringComparison.Ordinal);
            return Encoding.UTF8.GetBytes(text[..at] + to + text[(at + from.Length)..]);
        }, expect);

    private static byte[] Replace(byte[] bytes, int offset, string text)
    {
        var copy = bytes.ToArray();
        Encoding.ASCII.GetBytes(text).CopyTo(copy, offset);
        return copy;
    }

    /// <summary>The last occurrence of the ASCII <paramref name="text"/> replaced by <paramref name="bytes"/> of the same length.</summary>
    private static byte[] ReplaceLast(byte[] bytes, string text, byte[] replacement)
    {
        var copy = bytes.ToArray();
        var at = copy.AsSpan().LastIndexOf(Encoding.ASCII.GetBytes(text));
        if (at < 0 || replacement.Length != text.Length) throw new InvalidOperationException($"'{text}' is not in the file");
        replacement.CopyTo(copy, at);
        return copy;
    }

    /// <summary>The offset of the namestr header record (the eighth record).</summary>
    private const int NamestrHeader = 7 * 80;

    public static IEnumerable<BadInputCase> All()
    {
        // XPT version 5 transport files
        yield return Case("xpt: truncated inside a record", "xpt", b => b[..^37], "the file ends inside an 80-byte record", "truncated");
        yield return Case("xpt: truncated inside a row", "xpt", b => b[..^80], "row ", "the file ends inside the row", "truncated");
        yield return Case("xpt: truncated in the headers", "xpt", b => b[..400], "record 6", "truncated");
        yield return Case("xpt: an empty file", "xpt", _ => [], "record 1", "the file ends where the library header record should be");
        yield return Case("xpt: wrong library header record", "xpt", b => Replace(b, 20, "LIBRARY HEADER RECORX"), "record 1", "expected the library header record");
        yield return Case("xpt: a CSV file named .xpt", "xpt", _ => Encoding.UTF8.GetBytes(MiniStudy.Adsl), "record 1", "expected the library header record");
        yield return Case("xpt: version 8 library header", "xpt", b => Replace(b, 20, "LIBV8   HEADER RECORD"), "record 1", "version 5");
        yield return Case("xpt: wrong member header record", "xpt", b => Replace(b, 3 * 80 + 20, "MEMBER  HEADER RECORX"), "record 4", "expected the member header record");
        yield return Case("xpt: namestr count too high", "xpt", b => Replace(b, NamestrHeader + 54, "0007"), "namestr", "disagree");
        yield return Case("xpt: namestr count too low", "xpt", b => Replace(b, NamestrHeader + 54, "0005"), "namestr count disagrees");
        yield return Case("xpt: namestr count not a number", "xpt", b => Replace(b, NamestrHeader + 54, "00x6"), "record 8", "expected a number");
        yield return Case("xpt: two members", "xpt", b => [.. b, .. b[(3 * 80)..]], "more than one dataset");
        yield return Case("xpt: control character in a value", "xpt", b => ReplaceLast(b, "Placebo", [(byte)'P', 1, .. "acebo"u8]),
            "variable TRT01P", "row 2", "control character U+0001 at character 2", "--control-characters replace");
        yield return Case("xpt: noncharacter U+FFFE in a value", "xpt", b => ReplaceLast(b, "Placebo", [.. "Plac"u8, 0xEF, 0xBF, 0xBE]),
            "variable TRT01P", "row 2", "noncharacter U+FFFE at character 5");

        // Dataset-JSON 1.1
        yield return Case("dataset-json: unterminated", "json", b => b[..^40], "invalid JSON", "unterminated");
        yield return Case("dataset-json: not JSON", "json", _ => Encoding.UTF8.GetBytes(MiniStudy.Adsl), "invalid JSON", "line 1");
        yield return JsonCase("dataset-json: a row shorter than the columns", "json", ",\"Y\",66]", ",\"Y\"]", "row 4 has 5 values", "\"columns\" lists 6");
        yield return JsonCase("dataset-json: a row longer than the columns", "json", ",\"Y\",66]", ",\"Y\",66,1]", "row 4 has more values");
        yield return JsonCase("dataset-json: a string in an integer column", "json", ",\"Y\",66]", ",\"Y\",\"66\"]", "row 4, column AGE", "expected an integer", "found the string");
        yield return JsonCase("dataset-json: a number in a string column", "json", ",\"Y\",66]", ",1,66]", "row 4, column ITTFL", "expected a string", "found a number");
        yield return JsonCase("dataset-json: records disagree", "json", "\"records\":5", "\"records\":6", "\"records\" gives 6 rows, but the file holds 5");
        yield return JsonCase("dataset-json: unknown dataType", "json", "\"dataType\":\"integer\"", "\"dataType\":\"int\"", "dataType \"int\" is unknown");
        yield return JsonCase("dataset-json: rows before columns", "json", "\"columns\"", "\"rows\":[],\"columns\"", "\"rows\" comes before \"columns\"");
        yield return JsonCase("dataset-json: version 1.0", "json", "\"1.1.0\"", "\"1.0.0\"", "OutputForge reads Dataset-JSON 1.1");
        yield return JsonCase("dataset-json: a row that is an object", "json", "[\"T1\",\"T1-002\"", "{\"a\":1},[\"T1\",\"T1-002\"", "expected a row");
        yield return JsonCase("ndjson: a row shorter than the columns", "ndjson", ",\"Y\",66]", ",\"Y\"]", "row 4 has 5 values");
        yield return JsonCase("ndjson: records disagree", "ndjson", "\"records\":5", "\"records\":4", "\"records\" gives 4 rows, but the file holds 5");
        yield return Case("ndjson: unterminated row", "ndjson", b => b[..^4], "invalid JSON", "unterminated");

        // the value rules of every format (as for CSV): unusable numbers, text a document cannot hold, encoding
        yield return JsonCase("dataset-json: a number beyond the double range", "json", ",\"Y\",66]", ",\"Y\",1e400]", "row 4, column AGE", "'1e400' overflows");
        yield return JsonCase("dataset-json: a number beyond 1e100", "json", ",\"Y\",66]", ",\"Y\",-1e300]", "row 4, column AGE", "'-1e300' is beyond 1e100 in magnitude");
        yield return JsonCase("ndjson: a number beyond 1e100", "ndjson", ",\"Y\",66]", ",\"Y\",1e300]", "row 4, column AGE", "'1e300' is beyond 1e100");
        yield return JsonCase("dataset-json: a control character escape in a value", "json", "\"Active\"", "\"Act\\u0001ive\"", "row 3, column TRT01P", "control character U+0001 at character 4", "--control-characters replace");
        yield return JsonCase("dataset-json: a lone surrogate escape in a value", "json", "\"Active\"", "\"Act\\ud800ive\"", "row 3, column TRT01P", "lone UTF-16 surrogate U+D800");
        yield return JsonCase("dataset-json: noncharacter U+FFFE in a value", "json", "\"Active\"", "\"Active\uFFFE\"", "row 3, column TRT01P", "noncharacter U+FFFE at character 7");
        yield return JsonCase("ndjson: noncharacter U+FDD0 in a value", "ndjson", "\"Active\"", "\"\uFDD0Active\"", "row 3, column TRT01P", "noncharacter U+FDD0 at character 1");
        yield return JsonCase("dataset-json: a value of 40,000 characters", "json", "\"Active\"", $"\"{new string('A', 40_000)}\"", "row 3, column TRT01P", "40,000 characters long, more than the 32,767");
        yield return Case("dataset-json: a value that is not UTF-8", "json", b => ReplaceLast(b, "Active", [.. "Activ"u8, 0xE9]), "row 5, column TRT01P", "not valid UTF-8");
        yield return JsonCase("dataset-json: a label with a lone surrogate escape", "json", "\"label\":\"AGE\"", "\"label\":\"A\\udc00\"", "in columns[5]", "lone UTF-16 surrogate escape");
    }
}
