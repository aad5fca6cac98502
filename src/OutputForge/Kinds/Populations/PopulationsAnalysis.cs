using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Kinds.Populations;

/// <summary>
/// Summary of analysis populations: for each row (a population of the study spec, or an ADSL
/// condition), n (%) of the subjects of the table's population (the denominator, e.g. all
/// randomized subjects) per arm of that population. Row keys: the population's name, or the
/// row's own key.
/// </summary>
public sealed class PopulationsAnalysis : ITableAnalysis
{
    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var reads = PopulationSelection.Reads(study, table, new VariableReads());
        foreach (var row in table.Settings<PopulationsSettings>().Rows)
        {
            var where = row.Population is { } name ? study.Populations.GetValueOrDefault(name)?.Where : row.Where;
            reads.AddCondition(VariableReads.SubjectLevel, where);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var settings = table.Settings<PopulationsSettings>();
        var selection = PopulationSelection.Select(study, table, data);
        var adsl = data.SubjectLevel;
        var subjects = SubjectRows.Of(adsl, selection);
        var columns = SummaryColumns.For(selection, study, settings.Total);
        var rows = new List<ResultRow>();
        for (var i = 0; i < settings.Rows.Count; i++)
        {
            var spec = settings.Rows[i];
            var pointer = $"/populations/rows/{i}";
            string key, label, where, wherePointer;
            SpecSource whereSource;
            if (spec.Population is { } name)
            {
                if (!study.Populations.TryGetValue(name, out var population))
                {
                    throw new SpecException(table.Source.Problem(SpecProblemCode.UnknownReference, pointer + "/population",
                        $"unknown population '{name}'{Naming.NearestName.Hint(name, study.Populations.Keys.ToList())}"));
                }
                (key, label, where, whereSource, wherePointer) = (name, spec.Label ?? population.Label, population.Where, study.Source, $"/populations/{name}/where");
            }
            else
            {
                (key, label, where, whereSource, wherePointer) = (spec.Key!, spec.Label!, spec.Where!, table.Source, pointer + "/where");
            }
            key = ResultKey.Part(key);
            if (rows.Any(r => r.Key == key))
            {
                throw new SpecException(table.Source.Problem(pointer, $"row key '{key}' is used twice in this table"));
            }
            var condition = new SpecConditionText(where, whereSource, wherePointer).Compile(adsl);
            var inRow = subjects.Where(s => condition.Matches(s.Row)).ToList();
            rows.Add(new ResultRow(key, label, 0,
                columns.Select(c => CountCells.CountPercent(c.Key, inRow.Count(s => c.Holds(s.Arm)), c.N, settings.Percent)).ToList()));
        }
        List<ResultNote> notes =
        [
            ResultNote.Footnote("denominators", NoteKind.Denominators, ("population", selection.Label), ("armVariable", selection.TreatmentVariable)),
            .. NotEstimableNotes.Of(rows),
        ];
        return new TableResult(table.Id, table.Title, selection.Label, SummaryColumns.ToResultColumns(columns), rows, [], selection.Warnings,
            table.Footnotes, new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl"]), settings.Percent.Decimals,
            PercentStyle: SummaryColumns.StyleOf(settings.Percent)) { Notes = notes };
    }
}
