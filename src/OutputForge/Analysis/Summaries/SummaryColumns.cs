using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Analysis.Summaries;

/// <summary>The arm columns of a population, in display order, with a Total column when the table (or else the study) asks for one.</summary>
public static class SummaryColumns
{
    public static IReadOnlyList<SummaryColumn> For(PopulationSelection selection, StudySpec study, bool? tableTotal)
    {
        var columns = selection.Arms
            .Select(a => new SummaryColumn(a.Key, a.Label, selection.Count(a), new HashSet<TreatmentArm> { a }, false))
            .ToList();
        if (tableTotal ?? study.Treatment.Total)
        {
            columns.Add(new SummaryColumn(ResultKey.Total, "Total", selection.Arms.Sum(selection.Count),
                selection.Arms.ToHashSet(), true));
        }
        return columns;
    }

    public static List<ResultColumn> ToResultColumns(IEnumerable<SummaryColumn> columns) =>
        columns.Select(c => new ResultColumn(c.Key, c.Label, c.N)).ToList();

    public static PercentStyle StyleOf(PercentDisplaySpec percent) =>
        new(ZeroAsCountOnly: percent.Zero != ZeroDisplay.CountPercent, EdgeMarks: percent.Edges);
}
