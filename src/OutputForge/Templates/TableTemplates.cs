using OutputForge.Layout;
using Scriban.Runtime;

namespace OutputForge.Templates;

/// <summary>Replaces a laid-out table's printed texts (title block, page header and footer lines, footnotes) by its templates' output.</summary>
public static class TableTemplates
{
    public static TableDocument Apply(TemplateSet templates, TableDocument document, ScriptObject values) => document with
    {
        TitleLines = TemplateOutput.Lines(templates.Render(TemplateNames.Title, values)),
        StudyLine = TemplateOutput.Line(templates.Render(TemplateNames.PageHeader, values)),
        ContinuedLine = TemplateOutput.Line(templates.Render(TemplateNames.Continued, values)),
        Footnotes = TemplateOutput.Lines(templates.Render(TemplateNames.Footnotes, values)),
        FooterLines = TemplateOutput.Lines(templates.Render(TemplateNames.PageFooter, values)),
    };
}
