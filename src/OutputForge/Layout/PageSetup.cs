using OutputForge.Spec;

namespace OutputForge.Layout;

/// <summary>The page a study's tables are laid out on: the study spec's page settings over the defaults.</summary>
public static class PageSetup
{
    public static PageSettings From(PageSpec? spec)
    {
        var page = PageSettings.Default;
        if (spec is null)
        {
            return page;
        }
        return page with
        {
            Paper = spec.Paper == "a4" ? PaperSize.A4 : PaperSize.Letter,
            Orientation = spec.Orientation == "portrait" ? PageOrientation.Portrait : PageOrientation.Landscape,
            FontName = spec.Font ?? page.FontName,
            FontSizePoints = spec.FontSize ?? page.FontSizePoints,
        };
    }
}
