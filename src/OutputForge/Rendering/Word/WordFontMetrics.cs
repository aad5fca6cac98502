using OutputForge.Layout;

namespace OutputForge.Rendering.Word;

/// <summary>
/// An estimate of how wide text is, used to size the table columns (the renderer has no font
/// files). Monospaced fonts advance 0.6 em per character (the Courier design); for proportional
/// fonts 0.55 em is used, the width of the digits in common sans-serif fonts, so that numbers
/// never get a column that is too narrow.
/// </summary>
public sealed record WordFontMetrics(double CharacterWidthTwips, int HalfPoints)
{
    private static readonly string[] MonospacedNames = ["Courier", "Mono", "Consolas", "Lucida Console", "Menlo"];

    public static WordFontMetrics From(PageSettings page)
    {
        if (!(page.FontSizePoints > 0) || page.FontSizePoints > 72)
            throw new TableRenderException($"Font size {page.FontSizePoints} pt is not between 0 and 72 pt.");
        if (string.IsNullOrWhiteSpace(page.FontName))
            throw new TableRenderException("The page settings name no font.");
        bool monospaced = MonospacedNames.Any(n => page.FontName.Contains(n, StringComparison.OrdinalIgnoreCase));
        double em = monospaced ? 0.6 : 0.55;
        return new WordFontMetrics(page.FontSizePoints * 20 * em, (int)Math.Round(page.FontSizePoints * 2));
    }

    public int Width(int characters) => (int)Math.Ceiling(characters * CharacterWidthTwips);
}
