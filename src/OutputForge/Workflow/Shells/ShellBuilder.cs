using OutputForge.Analysis;
using OutputForge.Layout;
using OutputForge.Spec;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// A mock shell of one table: the table kind's own analysis run on stand-in data (<see cref="ShellData"/>),
/// laid out by the Layout stage with placeholders in place of every number and "(N=xx)" headers.
/// The layout, titles, row labels and footnotes are those the table will have; warnings, which
/// would be about the stand-in data, are left out.
/// </summary>
public static class ShellBuilder
{
    public static LaidOutTable Build(StudySpec study, TableSpec table, string studyLine, RunFacts run, PageSettings page)
    {
        var data = ShellData.For(study, table);
        var result = TableAnalyses.For(table).Analyze(study, table, data) with { Warnings = [] };
        try
        {
            return TableLayoutBuilder.Build(result, studyLine, run, page, NumberDisplay.Placeholders, OutputForge.Pipeline.PackageRunner.ColumnGroupsOf(study));
        }
        catch (ColumnGroupException e)
        {
            // The same located spec error as a run gives, not an internal fault.
            throw new SpecException(study.Source.Problem(e.Where, $"table {table.Id}: {e.Message}"));
        }
    }
}
