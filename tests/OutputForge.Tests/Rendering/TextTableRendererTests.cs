using System.Text;
using OutputForge.Layout;
using OutputForge.Rendering;
using OutputForge.Rendering.Text;

namespace OutputForge.Tests.Rendering;

public sealed class TextTableRendererTests
{
    private readonly TextTableRenderer _renderer = new();

    [Fact]
    public void Responder_table_matches_the_approved_preview() =>
        ApprovedFile.Verify("ResponderTable", _renderer.Render(ResponderTableFixture.Responders()));

    [Fact]
    public void Long_table_matches_the_approved_preview() =>
        ApprovedFile.Verify("LongTable", _renderer.Render(ResponderTableFixture.LongTable()));

    [Fact]
    public void Output_is_deterministic_with_unix_line_endings_and_no_trailing_blanks()
    {
        var document = ResponderTableFixture.Responders();
        string first = _renderer.Render(document);
        string second = _renderer.Render(document);

        Assert.Equal(first, second);
        Assert.DoesNotContain('\r', first);
        Assert.DoesNotContain('\t', first);
        Assert.EndsWith("\n", first);
        Assert.All(first.Split('\n'), line => Assert.Equal(line.TrimEnd(), line));
    }

    [Fact]
    public void Stream_output_is_the_preview_in_utf8_without_byte_order_mark()
    {
        var document = ResponderTableFixture.Responders() with { StudyLine = "Étude QF217-301" };
        using var stream = new MemoryStream();
        _renderer.Write(document, stream);

        Assert.Equal(new UTF8Encoding(false).GetBytes(_renderer.Render(document)), stream.ToArray());
        Assert.Equal((byte)0xC3, stream.ToArray()[0]);
    }

    [Fact]
    public void Spanning_header_is_centered_over_the_columns_it_spans_and_underlined_across_them()
    {
        var lines = _renderer.Render(ResponderTableFixture.Responders()).Split('\n');
        int spanLine = Array.FindIndex(lines, l => l.Trim() == "QF-217");
        string underline = lines[spanLine + 1];
        string doses = lines[spanLine + 2];

        int start = underline.IndexOf('-');
        int end = underline.LastIndexOf('-');
        Assert.Equal(underline.Length - 1, end);
        Assert.Equal(underline.Substring(start), new string('-', end - start + 1));
        // The underline runs from the start of the 10 mg column to the end of the 30 mg column.
        Assert.InRange(doses.IndexOf("10 mg", StringComparison.Ordinal), start, end);
        Assert.InRange(doses.IndexOf("30 mg", StringComparison.Ordinal) + "30 mg".Length - 1, start, end);
        Assert.Equal(' ', doses[start - 1 - TextTableRenderer.ColumnGap + 1]);
        int textStart = lines[spanLine].IndexOf('Q');
        int left = textStart - start;
        int right = end - (textStart + "QF-217".Length - 1);
        Assert.InRange(left - right, 0, 1);
    }

    [Fact]
    public void Labels_are_indented_two_spaces_per_level_and_rules_span_the_table()
    {
        var lines = _renderer.Render(ResponderTableFixture.Responders()).Split('\n');
        var rules = lines.Where(l => l.Length > 0 && l.All(c => c == '-')).ToList();

        Assert.Equal(3, rules.Count);
        Assert.Single(rules.Distinct());
        Assert.Contains(lines, l => l.StartsWith("Response at Week 12 [a]", StringComparison.Ordinal));
        Assert.Contains(lines, l => l.StartsWith("  Responders, n (%)", StringComparison.Ordinal));
        Assert.Equal(rules[0].Length, lines.Max(l => l.StartsWith('[') || l.StartsWith("Source", StringComparison.Ordinal) ? 0 : l.Length));
    }

    [Fact]
    public void A_spanning_header_wider_than_its_columns_widens_them()
    {
        var document = ResponderTableFixture.Responders() with
        {
            HeaderRows = [new HeaderRow([new HeaderCell("Statistic"), new HeaderCell("P"), new HeaderCell("QF-217 once daily, all doses pooled", 2)])],
            Rows = [new BodyRow("n", 0, [new LayoutCell("1"), new LayoutCell("2"), new LayoutCell("3")])],
        };
        var lines = _renderer.Render(document).Split('\n');
        var header = lines.Single(l => l.Contains("pooled", StringComparison.Ordinal));

        Assert.StartsWith("Statistic", header);
        Assert.EndsWith("QF-217 once daily, all doses pooled", header);
        Assert.Equal(lines.First(l => l.StartsWith('-')).Length, header.Length);
    }

    [Fact]
    public void Rows_with_the_wrong_number_of_cells_are_a_clear_error()
    {
        var document = ResponderTableFixture.Responders() with { Rows = [new BodyRow("n", 0, [new LayoutCell("1")])] };

        var error = Assert.Throws<TableRenderException>(() => _renderer.Render(document));
        Assert.Equal("Table 14.2.1: body row 1 (\"n\") has 1 cells but the table has 3 value columns.", error.Message);
    }
}
