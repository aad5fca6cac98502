using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// How many pages a table will take, estimated from its line count, for the page numbers shown
/// in a table of contents before Word or LibreOffice updates its PAGEREF fields (they lay the
/// pages out themselves; this only spares the reader a list of "1"s). Wrapped texts are counted
/// at the estimated character width.
/// </summary>
public static class WordPageEstimate
{
    public static int Pages(TableDocument document)
    {
        var geometry = WordPageGeometry.From(document.Page);
        var font = WordFontMetrics.From(document.Page);
        // 1.25 lines per line of text plus the 1 pt cell padding: the 300-row check table
        // (LongTablePaginationTests) takes 9 pages in LibreOffice, as estimated.
        double lineTwips = document.Page.FontSizePoints * 20 * 1.25 + 20;
        // The page headers' two lines come out of the text height.
        int linesPerPage = Math.Max(1, (int)((geometry.HeightTwips - 2 * geometry.MarginTwips) / lineTwips) - 2);
        int charactersPerLine = Math.Max(1, (int)(geometry.TextWidthTwips / font.CharacterWidthTwips));
        int Wrapped(string text) => CellLines.Split(text).Sum(l => Math.Max(1, (l.Length + charactersPerLine - 1) / charactersPerLine));

        int header = document.HeaderRows.Sum(r => r.Cells.Max(c => CellLines.Split(c.Text).Length));
        int lines = document.TitleLines.Sum(Wrapped) + 1 + header + document.Footnotes.Sum(Wrapped) + 1;
        lines += document.Rows.Sum(r => Math.Max(CellLines.Split(r.Label).Length, r.Cells.Select(c => CellLines.Split(c.Text).Length).DefaultIfEmpty(1).Max()));
        // Each later page repeats the column headers.
        int pages = 1;
        int left = lines - linesPerPage;
        while (left > 0)
        {
            pages++;
            left -= Math.Max(1, linesPerPage - header);
        }
        return pages;
    }
}
