using System.Globalization;
using System.Text;
using System.Text.RegularExpressions;
using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Spreadsheet;
using OutputForge.Results;

namespace OutputForge.Rendering.Excel;

/// <summary>
/// Writes the data rows of the results sheet straight into the saved package. The results sheet holds one row per
/// number of the whole package (17,000 rows for the 60 tables of the pooled study), many times more cells than all the
/// table sheets together; made cell by cell in ClosedXML and saved by it, it was the longest step after the last
/// table (docs/performance.md). ClosedXML writes the sheet's frame (header row, widths, frozen row, autofilter over
/// the final range, print setup) and one probe row whose value cell carries the number style; this class replaces
/// the probe row with the records, streamed as ECMA-376 Part 1 cells (18.3.1.4 c): text as inline strings
/// (t="inlineStr", 18.3.1.53 is), numbers as plain values with the probe's style. Empty text makes no cell, as in
/// ClosedXML.
/// </summary>
internal static partial class ExcelResultsRows
{
    private const string Columns = "ABCDEFGHIJ";

    [GeneratedRegex(@"<(?<p>\w+:)?sheetData>.*</\k<p>sheetData>", RegexOptions.Singleline)]
    private static partial Regex SheetData();

    [GeneratedRegex(@"<(?<p>\w+:)?row\b[^>]*>.*?</\k<p>row>", RegexOptions.Singleline)]
    private static partial Regex Row();

    [GeneratedRegex(@"\br=""E2""[^>]*?\bs=""(?<s>\d+)""|\bs=""(?<s>\d+)""[^>]*?\br=""E2""")]
    private static partial Regex ProbeStyle();

    [GeneratedRegex(@"(<(\w+:)?dimension ref="")[^""]*("")")]
    private static partial Regex Dimension();

    /// <summary>The probe row ClosedXML writes: a number in the value column, styled like every value cell.</summary>
    public const double ProbeValue = 0;

    public static void Fill(SpreadsheetDocument document, string sheetName, IReadOnlyList<ResultRecord> records)
    {
        var workbook = document.WorkbookPart ?? throw new TableRenderException("the workbook has no workbook part");
        var sheet = workbook.Workbook.Sheets?.Elements<Sheet>().FirstOrDefault(s => s.Name?.Value == sheetName)
            ?? throw new TableRenderException($"the workbook has no sheet '{sheetName}'");
        var part = (WorksheetPart)workbook.GetPartById(sheet.Id!.Value!);
        string xml;
        using (var reader = new StreamReader(part.GetStream(FileMode.Open, FileAccess.Read), Encoding.UTF8))
        {
            xml = reader.ReadToEnd();
        }
        var data = SheetData().Match(xml);
        if (!data.Success)
            throw new TableRenderException($"the saved sheet '{sheetName}' has no sheet data");
        var prefix = data.Groups["p"].Value;
        var rows = Row().Matches(data.Value);
        if (rows.Count == 0)
            throw new TableRenderException($"the saved sheet '{sheetName}' has no header row");
        var numberStyle = rows.Count > 1 && ProbeStyle().Match(rows[1].Value) is { Success: true } probe
            ? probe.Groups["s"].Value
            : null;
        var lastRow = records.Count + 1;
        var before = Dimension().Replace(xml[..data.Index], m => $"{m.Groups[1].Value}A1:{Columns[^1]}{lastRow}{m.Groups[3].Value}", 1);
        using var output = new StreamWriter(part.GetStream(FileMode.Create, FileAccess.Write), new UTF8Encoding(false), 1 << 16);
        output.Write(before);
        output.Write($"<{prefix}sheetData>");
        output.Write(rows[0].Value);
        var cell = new StringBuilder(256);
        for (var i = 0; i < records.Count; i++)
        {
            var record = records[i];
            var row = i + 2;
            output.Write($"<{prefix}row r=\"{row}\" spans=\"1:{Columns.Length}\">");
            Text(output, cell, prefix, 'A', row, record.Table);
            Text(output, cell, prefix, 'B', row, record.Row);
            Text(output, cell, prefix, 'C', row, record.Column);
            Text(output, cell, prefix, 'D', row, record.Statistic);
            if (record.Value is double value && double.IsFinite(value))
            {
                if (numberStyle is null)
                    throw new TableRenderException($"the saved sheet '{sheetName}' has no probe row for the number style");
                output.Write($"<{prefix}c r=\"E{row}\" s=\"{numberStyle}\"><{prefix}v>{Number(value)}</{prefix}v></{prefix}c>");
            }
            else if (record.Value is double other)
            {
                Text(output, cell, prefix, 'E', row, other.ToString(CultureInfo.InvariantCulture));
            }
            Text(output, cell, prefix, 'F', row, record.Formatted);
            Text(output, cell, prefix, 'G', row, record.RowLabel);
            Text(output, cell, prefix, 'H', row, record.ColumnLabel);
            Text(output, cell, prefix, 'I', row, record.Method);
            Text(output, cell, prefix, 'J', row, record.Note);
            output.Write($"</{prefix}row>");
        }
        output.Write($"</{prefix}sheetData>");
        output.Write(xml.AsSpan(data.Index + data.Length));
    }

    /// <summary>
    /// Excel keeps 15 significant digits of a number (common practice; ECMA-376 stores xsd:double), and ClosedXML
    /// writes cells the same way, so the sheet holds what Excel would show and results.json the full double.
    /// </summary>
    public static string Number(double value) => value.ToString("G15", CultureInfo.InvariantCulture);

    private static void Text(StreamWriter output, StringBuilder cell, string prefix, char column, int row, string? text)
    {
        if (string.IsNullOrEmpty(text))
            return;
        cell.Clear();
        cell.Append('<').Append(prefix).Append("c r=\"").Append(column).Append(row).Append("\" t=\"inlineStr\"><")
            .Append(prefix).Append("is><").Append(prefix).Append('t');
        if (char.IsWhiteSpace(text[0]) || char.IsWhiteSpace(text[^1]))
            cell.Append(" xml:space=\"preserve\"");
        cell.Append('>');
        Escape(cell, text);
        cell.Append("</").Append(prefix).Append("t></").Append(prefix).Append("is></").Append(prefix).Append("c>");
        output.Write(cell);
    }

    /// <summary>
    /// Escapes markup characters; a character XML 1.0 cannot hold (a control character, which the data reader already
    /// refuses or replaces, or a lone surrogate) becomes U+FFFD rather than an unreadable package.
    /// </summary>
    private static void Escape(StringBuilder cell, string text)
    {
        for (var i = 0; i < text.Length; i++)
        {
            var c = text[i];
            switch (c)
            {
                case '&': cell.Append("&amp;"); break;
                case '<': cell.Append("&lt;"); break;
                case '>': cell.Append("&gt;"); break;
                case '\t' or '\n' or '\r': cell.Append(c); break;
                case < ' ' or '\uFFFE' or '\uFFFF': cell.Append('\uFFFD'); break;
                default:
                    if (char.IsHighSurrogate(c) && i + 1 < text.Length && char.IsLowSurrogate(text[i + 1]))
                    {
                        cell.Append(c).Append(text[++i]);
                    }
                    else
                    {
                        cell.Append(char.IsSurrogate(c) ? '\uFFFD' : c);
                    }
                    break;
            }
        }
    }
}
