using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// Paper, orientation and margins in twentieths of a point (twips), the unit of WordprocessingML
/// page and table measures (ECMA-376 Part 1, 17.6.13 pgSz and 17.6.11 pgMar).
/// </summary>
public sealed record WordPageGeometry(int WidthTwips, int HeightTwips, int MarginTwips, bool Landscape)
{
    public const int TwipsPerInch = 1440;

    /// <summary>
    /// Distance of the page header (and footer) from the paper edge: half an inch (common
    /// practice), or half the margin when the margin is narrower than an inch.
    /// </summary>
    public int HeaderDistanceTwips => Math.Min(720, MarginTwips / 2);

    public int TextWidthTwips => WidthTwips - 2 * MarginTwips;

    public static WordPageGeometry From(PageSettings page)
    {
        // Letter is 8.5 x 11 in; A4 is 210 x 297 mm = 11906 x 16838 twips (ISO 216).
        (int shortSide, int longSide) = page.Paper switch
        {
            PaperSize.A4 => (11906, 16838),
            _ => (12240, 15840),
        };
        bool landscape = page.Orientation == PageOrientation.Landscape;
        int margin = (int)Math.Round(page.MarginInches * TwipsPerInch);
        var geometry = landscape
            ? new WordPageGeometry(longSide, shortSide, margin, true)
            : new WordPageGeometry(shortSide, longSide, margin, false);
        if (margin < 0 || geometry.TextWidthTwips < TwipsPerInch || geometry.HeightTwips - 2 * margin < TwipsPerInch)
            throw new TableRenderException(
                $"Margins of {page.MarginInches} in leave less than one inch of text on a {page.Paper} page.");
        return geometry;
    }

    /// <summary>The section's page size, as every section of a document uses it.</summary>
    public DocumentFormat.OpenXml.Wordprocessing.PageSize PageSize() => new()
    {
        Width = (DocumentFormat.OpenXml.UInt32Value)(uint)WidthTwips,
        Height = (DocumentFormat.OpenXml.UInt32Value)(uint)HeightTwips,
        Orient = Landscape
            ? DocumentFormat.OpenXml.Wordprocessing.PageOrientationValues.Landscape
            : DocumentFormat.OpenXml.Wordprocessing.PageOrientationValues.Portrait,
    };

    /// <summary>The section's margins, with the header and footer at their distance from the edge.</summary>
    public DocumentFormat.OpenXml.Wordprocessing.PageMargin PageMargin() => new()
    {
        Top = MarginTwips,
        Bottom = MarginTwips,
        Left = (DocumentFormat.OpenXml.UInt32Value)(uint)MarginTwips,
        Right = (DocumentFormat.OpenXml.UInt32Value)(uint)MarginTwips,
        Header = (DocumentFormat.OpenXml.UInt32Value)(uint)HeaderDistanceTwips,
        Footer = (DocumentFormat.OpenXml.UInt32Value)(uint)HeaderDistanceTwips,
        Gutter = 0U,
    };
}
