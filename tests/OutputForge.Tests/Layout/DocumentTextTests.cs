using OutputForge.Data;
using OutputForge.Layout;
using OutputForge.Tests.Support;
using OutputForge.Common;

namespace OutputForge.Tests.Layout;

/// <summary>
/// One rule for text that reaches a document, from the spec, the data or a template: at most 32,767 characters, no
/// control characters, noncharacters (Unicode Standard section 23.7) or lone surrogates.
/// </summary>
public sealed class DocumentTextTests
{
    [Theory]
    [InlineData("a\u0001b", "the control character U+0001")]
    [InlineData("a\uFFFEb", "the noncharacter U+FFFE")]
    [InlineData("a\uFFFFb", "the noncharacter U+FFFF")]
    [InlineData("a\uFDD0b", "the noncharacter U+FDD0")]
    [InlineData("a\uFDEFb", "the noncharacter U+FDEF")]
    [InlineData("a\U0001FFFEb", "the noncharacter U+1FFFE")]
    [InlineData("a\U0010FFFFb", "the noncharacter U+10FFFF")]
    [InlineData("lone high surrogate", "a lone UTF-16 surrogate U+D800 (half of a character)")]
    [InlineData("lone low surrogate", "a lone UTF-16 surrogate U+DC00 (half of a character)")]
    public void Every_character_a_document_cannot_hold_is_found_and_named(string text, string named)
    {
        // A lone surrogate cannot pass through a test attribute's string intact: it is made here.
        text = text switch { "lone high surrogate" => "a\uD800b", "lone low surrogate" => "a\uDC00b", _ => text };
        Assert.Equal(1, ControlCharacters.IndexIn(text));
        Assert.Equal(named, ControlCharacters.Describe(text, 1));
        Assert.Equal($"the text holds {named} at character 2, which Word and Excel cannot store", DocumentText.Problem(text));
    }

    [Theory]
    [InlineData("tab\tline\nreturn\r")]
    [InlineData("\uFDCF\uFDF0\uFFFD")]
    [InlineData("emoji \U0001F600 and \U0001FFFD")]
    [InlineData("")]
    public void Text_a_document_can_hold_passes(string text)
    {
        Assert.Equal(-1, ControlCharacters.IndexIn(text));
        Assert.Null(DocumentText.Problem(text));
    }

    [Fact]
    public void Replacing_shows_each_forbidden_character_as_one_marker()
    {
        Assert.Equal("a\uFFFDb\uFFFDc\uFFFDd\U0001F600", ControlCharacters.Replace("a\u0001b\U0001FFFEc\uD800d\U0001F600"));
    }

    [Fact]
    public void The_length_limit_is_the_spreadsheet_cell_limit()
    {
        Assert.Null(DocumentText.Problem(new string('x', 32_767)));
        Assert.Equal("the text is 32,768 characters long, more than the 32,767 one table cell can hold (the same limit in every format)",
            DocumentText.Problem(new string('x', 32_768)));
    }

    [Fact]
    public void A_title_at_the_limit_is_written_whole_in_every_format()
    {
        var title = new string('M', DocumentText.MaxLength);
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("[\"Responders\"]", $"[\"{title}\"]"));
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--format", "docx,xlsx,txt", "--quiet"], error);
        Assert.True(code == 0, error.ToString());
        Assert.Contains(title, File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt")));
        Assert.Contains(title, string.Join("\n", DocumentReader.WordParagraphs(Path.Combine(study.OutputFolder, "table-1.docx"))));
        using var workbook = new ClosedXML.Excel.XLWorkbook(Path.Combine(study.OutputFolder, "table-1.xlsx"));
        Assert.Contains(workbook.Worksheet(1).CellsUsed(), c => c.GetString() == title);
    }

    [Fact]
    public void A_noncharacter_in_the_data_is_replaced_and_warned_about_when_asked_and_every_format_is_written()
    {
        var adsl = MiniStudy.Adsl.Replace(",Active,", ",Act\uFFFEive,");
        using var study = new MiniStudy(adsl: adsl);
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder, "--format", "docx,xlsx,txt",
            "--control-characters", "replace"], error);
        Assert.True(code == 0, error.ToString());
        Assert.Contains("3 values held control characters, replaced by U+FFFD", error.ToString());
        Assert.Contains("Act\uFFFDive", File.ReadAllText(Path.Combine(study.OutputFolder, "table-1.txt")));
        Assert.True(new FileInfo(Path.Combine(study.OutputFolder, "table-1.docx")).Length > 0);
        Assert.True(new FileInfo(Path.Combine(study.OutputFolder, "table-1.xlsx")).Length > 0);
    }

    [Fact]
    public void A_noncharacter_in_the_data_is_refused_by_default_with_its_place()
    {
        var adsl = MiniStudy.Adsl.Replace("T1,T1-003,Active,", "T1,T1-003,Act\uFFFEive,");
        using var study = new MiniStudy(adsl: adsl);
        var error = new StringWriter();
        var code = OutputForge.Cli.Program.Run(["run", "--spec", study.Folder, "--out", study.OutputFolder], error);
        Assert.Equal(2, code);
        Assert.Contains("adsl.csv line 4, variable TRT01P: the value holds the noncharacter U+FFFE at character 4", error.ToString());
    }
}
