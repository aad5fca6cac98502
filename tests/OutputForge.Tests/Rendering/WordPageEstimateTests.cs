using OutputForge.Rendering.Word;

namespace OutputForge.Tests.Rendering;

public sealed class WordPageEstimateTests
{
    // Letter landscape, 1 in margins, 9 pt lines of 9 * 20 * 1.25 + 20 = 245 twips: (12240 - 2880) / 245
    // = 38 lines, 36 after the two page-header lines (the arithmetic of WordPageEstimate, checked by hand).
    [Fact]
    public void A_short_table_takes_one_page()
    {
        Assert.Equal(1, WordPageEstimate.Pages(ResponderTableFixture.Responders()));
    }

    [Fact]
    public void A_200_row_table_takes_as_many_pages_as_its_lines_need_with_repeated_headers()
    {
        var table = ResponderTableFixture.LongTable();
        // 3 title lines + 1 + 2 header lines + 200 rows + 1 footnote + 1 = 208 lines: 36 on the first
        // page, then 34 a page (36 minus the 2 repeated header lines): 36 + 5 * 34 = 206 < 208 <= 240.
        Assert.Equal(7, WordPageEstimate.Pages(table));
    }
}
