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
    }
}
