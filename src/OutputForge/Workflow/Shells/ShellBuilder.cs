using OutputForge.Layout;
using OutputForge.Spec;
using OutputForge.Templates;

namespace OutputForge.Workflow.Shells;

/// <summary>
/// A mock shell of one table: the table kind's own analysis run on stand-in data (<see cref="ShellData"/>),
/// laid out by the Layout stage with placeholders in place of every number and "(N=xx)" headers,
/// and its printed texts made by the study's templates as in a run (<see cref="ShellTemplateValues"/>).
/// The layout, titles, row labels and footnotes are those the table will have; warnings, which
/// would be about the stand-in data, are left out.
/// </summary>
public static class ShellBuilder
{
    /// <summary>The shell, and what it assumed for lack of data (for the run log).</summary>
    public static (LaidOutTable Shell, IReadOnlyList<string> Assumptions) Build(StudySpec study, TableSpec table, string studyLine, RunFacts run,
        PageSettings page, TemplateSet templates)
    {
        var records = ShellData.For(study, table);
        var result = Kinds.TableKinds.For(table).Analysis.Analyze(study, table, records.ToStudyData()).WithoutWarnings() with { Figure = null };
        var laidOut = Pipeline.TableLayOut.Build(study, table, result, studyLine, run, page, NumberDisplay.Placeholders, templates,
            document => ShellTemplateValues.For(study, table, result, document, run));
        return (laidOut, records.Assumptions);
    }
}
