using DocumentFormat.OpenXml.Packaging;
using DocumentFormat.OpenXml.Wordprocessing;
using OutputForge.Rendering.Figures;
using OutputForge.Results;
using A = DocumentFormat.OpenXml.Drawing;
using DW = DocumentFormat.OpenXml.Drawing.Wordprocessing;
using PIC = DocumentFormat.OpenXml.Drawing.Pictures;

namespace OutputForge.Rendering.Word;

/// <summary>
/// A table's figure as an inline picture on a new page after the table and its footnotes, centered,
/// as wide as the text area allows (never taller than the page's text height less an inch for the
/// page header and footer), with the figure's alt text as the picture's description (ECMA-376 Part 1,
/// 20.4.2.5 docPr descr) so that screen readers announce it.
/// </summary>
public static class WordFigure
{
    private const long EmuPerTwip = 635;

    public static Paragraph Build(MainDocumentPart main, TableFigure figure, WordPageGeometry geometry, int pictureId)
    {
        var painted = FigurePainter.Paint(figure);
        var image = main.AddImagePart(ImagePartType.Png);
        using (var stream = new MemoryStream(painted.Png))
        {
            image.FeedData(stream);
        }
        var relationship = main.GetIdOfPart(image);
        long maxWidth = geometry.TextWidthTwips * EmuPerTwip;
        long maxHeight = (geometry.HeightTwips - 2 * geometry.MarginTwips - WordPageGeometry.TwipsPerInch) * EmuPerTwip;
        double scale = Math.Min((double)maxWidth / painted.WidthPixels, (double)maxHeight / painted.HeightPixels);
        long cx = (long)Math.Round(painted.WidthPixels * scale), cy = (long)Math.Round(painted.HeightPixels * scale);
        var id = (uint)pictureId;
        var name = $"Figure {pictureId}";
        var graphic = new A.Graphic(new A.GraphicData(
            new PIC.Picture(
                new PIC.NonVisualPictureProperties(
                    new PIC.NonVisualDrawingProperties { Id = id, Name = name, Description = figure.AltText },
                    new PIC.NonVisualPictureDrawingProperties()),
                new PIC.BlipFill(new A.Blip { Embed = relationship }, new A.Stretch(new A.FillRectangle())),
                new PIC.ShapeProperties(
                    new A.Transform2D(new A.Offset { X = 0, Y = 0 }, new A.Extents { Cx = cx, Cy = cy }),
                    new A.PresetGeometry(new A.AdjustValueList()) { Preset = A.ShapeTypeValues.Rectangle })))
        { Uri = "http://schemas.openxmlformats.org/drawingml/2006/picture" });
        var inline = new DW.Inline(
            new DW.Extent { Cx = cx, Cy = cy },
            new DW.EffectExtent { LeftEdge = 0, TopEdge = 0, RightEdge = 0, BottomEdge = 0 },
            new DW.DocProperties { Id = id, Name = name, Description = figure.AltText },
            new DW.NonVisualGraphicFrameDrawingProperties(new A.GraphicFrameLocks { NoChangeAspect = true }),
            graphic)
        { DistanceFromTop = 0, DistanceFromBottom = 0, DistanceFromLeft = 0, DistanceFromRight = 0 };
        return new Paragraph(
            new ParagraphProperties(new PageBreakBefore(), new Justification { Val = JustificationValues.Center }),
            new Run(new Drawing(inline)));
    }
}
