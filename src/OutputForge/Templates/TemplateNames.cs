namespace OutputForge.Templates;

/// <summary>The templates a table's text comes from (see docs/templates.md).</summary>
public static class TemplateNames
{
    /// <summary>The folder of a study's own templates, beside study.json; also the repository's folder of defaults.</summary>
    public const string Folder = "templates";

    /// <summary>The title block: one line of output per printed line.</summary>
    public const string Title = "title.sbn";

    /// <summary>The study line at the top left of every page.</summary>
    public const string PageHeader = "page-header.sbn";

    /// <summary>The line naming the table on its second and later pages.</summary>
    public const string Continued = "continued.sbn";

    /// <summary>The footnotes under the table.</summary>
    public const string Footnotes = "footnotes.sbn";

    /// <summary>The page footer (the source line).</summary>
    public const string PageFooter = "page-footer.sbn";

    public static IReadOnlyList<string> All { get; } = [Title, PageHeader, Continued, Footnotes, PageFooter];
}
