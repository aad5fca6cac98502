using DocumentFormat.OpenXml;
using DocumentFormat.OpenXml.Validation;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Layout;

namespace OutputForge.Tests.Rendering;

/// <summary>
/// A 300-row table: what makes it paginate cleanly in Word and LibreOffice is in the file (the
/// page breaks themselves are the application's): repeated header rows, rows that never split,
/// section labels kept with their first row, and a "(continued)" line on every page but the first.
/// </summary>
public sealed class LongTablePaginationTests
{
    private static TableDocument ThreeHundredRows()
    {
        var table = ResponderTableFixture.LongTable();
        return table with { Rows = NumberAlignment.Apply([.. table.Rows, .. table.Rows.Take(100)]) };
    }

    [Fact]
    public void Header_rows_repeat_body_rows_never_split_and_section_labels_keep_with_their_rows()
    {
        using var word = new WordDocumentReader(ThreeHundredRows());
        var rows = word.Table.Elements<TableRow>().ToList();

        Assert.Equal(2 + 300, rows.Count);
        Assert.All(rows.Take(2), r => Assert.NotNull(r.TableRowProperties!.GetFirstChild<TableHeader>()));
        Assert.All(rows.Skip(2), r => Assert.Null(r.TableRowProperties!.GetFirstChild<TableHeader>()));
        Assert.All(rows, r => Assert.NotNull(r.TableRowProperties!.GetFirstChild<CantSplit>()));
        var sectionLabels = rows.Skip(2).Where(r => WordDocumentReader.TextOf(r.Elements<TableCell>().First()).StartsWith("Body system", StringComparison.Ordinal)).ToList();
        Assert.Equal(30, sectionLabels.Count);
        Assert.All(sectionLabels, r => Assert.NotNull(r.Descendants<KeepNext>().SingleOrDefault()));
    }

    [Fact]
    public void Pages_after_the_first_name_the_table_with_continued()
    {
        using var word = new WordDocumentReader(ThreeHundredRows());
        var main = word.Package.MainDocumentPart!;
        var section = word.Body.GetFirstChild<SectionProperties>()!;
        Assert.NotNull(section.GetFirstChild<TitlePage>());

        string HeaderText(HeaderFooterValues type)
        {
            var reference = section.Elements<HeaderReference>().Single(h => h.Type!.Value == type);
            return WordDocumentReader.TextOf(((DocumentFormat.OpenXml.Packaging.HeaderPart)main.GetPartById(reference.Id!)).Header);
        }
        Assert.DoesNotContain("(continued)", HeaderText(HeaderFooterValues.First));
        Assert.EndsWith("Table 14.3.1.1 (continued)", HeaderText(HeaderFooterValues.Default));
    }

    [Fact]
    public void The_long_document_is_valid_office_open_xml()
    {
        using var word = new WordDocumentReader(ThreeHundredRows());
        Assert.Empty(new OpenXmlValidator(FileFormatVersions.Office2016).Validate(word.Package).Select(e => e.Description));
    }
}
