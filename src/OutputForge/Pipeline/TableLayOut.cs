using OutputForge.Layout;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Templates;
using Scriban.Runtime;

namespace OutputForge.Pipeline;

/// <summary>
/// The step shared by a run and by mock shells: a table's result laid out (numbers, or placeholders
/// for a shell) and its titles, header, footer and footnotes drawn by the study's templates with the
/// values the caller supplies. A bad arm group surfaces as the located spec error it is.
/// </summary>
public static class TableLayOut
{
    public static LaidOutTable Build(StudySpec study, TableSpec table, TableResult result, string studyLine, RunFacts run, PageSettings page,
        NumberDisplay display, TemplateSet templates, Func<TableDocument, ScriptObject> templateValues)
    {
        LaidOutTable laidOut;
        try
        {
            var population = new RecordPopulation(table.Population, study.Populations[table.Population].Where, table.Subset);
            laidOut = TableLayoutBuilder.Build(result, studyLine, run, page, display, StudyColumnGroups.Of(study), population);
        }
        catch (ColumnGroupException e)
        {
            throw new SpecException(study.Source.Problem(e.Where, $"table {table.Id}: {e.Message}"));
        }
        return laidOut with { Document = TableTemplates.Apply(templates, laidOut.Document, templateValues(laidOut.Document)) };
    }
}
