using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Kinds.CategoricalByVisit;

/// <summary>
/// Categorical (ordinal or nominal) response by visit: per visit and arm the subjects with a response
/// (n) and each category n (% of n), optionally the subjects without one; per visit one generalized
/// Cochran-Mantel-Haenszel p-value (Landis, Heyman and Koch 1978) over all arms or for each active arm
/// against the control, stratified by the spec's variables crossed, or unstratified.
/// </summary>
public sealed class CategoricalByVisitAnalysis : ITableAnalysis
{
    public const string PValueColumn = "p-value";

    public static string PValueKey(TreatmentArm arm) => $"p-value-{arm.Key}";

    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var settings = table.Settings<CategoricalByVisitSettings>();
        var endpoint = table.Endpoint!;
        var reads = PopulationSelection.Reads(study, table, new VariableReads())
            .Add(endpoint.Dataset, [AdamConformance.SubjectVariable, "AVISIT", settings.Variable])
            .Add(endpoint.Dataset, endpoint.Parameter is null ? null : "PARAMCD")
            .Add(endpoint.Dataset, settings.Visits is null ? "AVISITN" : null)
            .AddCondition(endpoint.Dataset, endpoint.Where);
        // Without an imputation type the records are the observed ones where the dataset marks derived records.
        reads = settings.Imputation is null ? reads.AddOptional(endpoint.Dataset, "DTYPE") : reads.Add(endpoint.Dataset, "DTYPE");
        foreach (var stratum in settings.Strata)
        {
            reads.AddRecordOrSubjectLevel(endpoint.Dataset, stratum);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<CategoricalByVisitSettings>();
        var statistics = table.Statistics;
        var selection = PopulationSelection.Select(study, table, data);
        var notes = new List<ResultNote>();
        var warnings = new List<ResultNote>();
        var categories = ResponseCategories.From(settings, table.Source);
        var responses = VisitResponses.Select(table, data, categories, warnings);
        var strata = settings.Strata.Select((s, i) => RecordVariable.Find(s, responses.Dataset, data, table.Source, $"/categoricalByVisit/strata/{i}")).ToList();
        var testing = settings.Test != GeneralizedCmhStatistic.None;
        var scores = testing ? categories.Scores(settings.Scores, table.Source) : [];
        var control = selection.Control;
        var allArms = settings.Comparison == ArmComparison.AllArms;
        if (testing && allArms && selection.Arms.Count < 2)
        {
            throw new SpecException(table.Source.Problem("/categoricalByVisit/comparison", "the population has a single arm; there is nothing to compare"));
        }
        var active = selection.Arms.Where(a => !a.IsControl).ToList();

        var columns = selection.Arms.Select(a => new ResultColumn(a.Key, a.Label, selection.Count(a))).ToList();
        if (testing)
        {
            columns.AddRange(allArms
                ? [new ResultColumn(PValueColumn, "p-value", null) { NoteRefs = [VisitTableNotes.TestNote] }]
                : active.Select(a => new ResultColumn(PValueKey(a), $"{a.Label}\nvs {control.Label}\np-value", null) { NoteRefs = [VisitTableNotes.TestNote] }));
        }
        var decimals = statistics.PercentDecimals;
        var rows = new List<ResultRow>();
        var imputedByVisit = new List<(string Visit, int Imputed)>();
        var testIssues = new List<ResultNote>();
        var comparisonsByVisit = new List<(string Visit, IReadOnlyList<VisitComparison> Comparisons)>();

        foreach (var visit in responses.Visits)
        {
            var visitKey = ResultKey.Part(visit);
            var ofVisit = responses.OfVisit(visit);
            var answered = selection.ArmOfSubject
                .Where(s => ofVisit.TryGetValue(s.Key, out var r) && r.Category >= 0)
                .Select(s => (Subject: s.Key, Arm: s.Value, Response: ofVisit[s.Key]))
                .OrderBy(s => s.Subject, StringComparer.Ordinal)
                .ToList();
            // One pass over the answers counts every arm and category.
            var n = selection.Arms.ToDictionary(a => a, _ => 0);
            var counts = selection.Arms.ToDictionary(a => a, _ => new int[categories.Count]);
            foreach (var answer in answered)
            {
                if (!n.ContainsKey(answer.Arm)) continue;
                n[answer.Arm]++;
                if (answer.Response.Category < categories.Count)
                {
                    counts[answer.Arm][answer.Response.Category]++;
                }
            }
            var imputed = answered.Count(s => s.Response.Imputed);
            if (settings.Imputation is not null)
            {
                imputedByVisit.Add((visit, imputed));
            }

            var comparisons = new List<VisitComparison>();
            if (testing)
            {
                var units = answered.Select(s => (s.Arm, s.Response.Category, Stratum(strata, s.Response.Row, s.Subject))).ToList();
                var sets = allArms
                    ? [(PValueColumn, (IReadOnlyList<TreatmentArm>)selection.Arms)]
                    : active.Select(a => (PValueKey(a), (IReadOnlyList<TreatmentArm>)[control, a])).ToList();
                foreach (var (key, arms) in sets)
                {
                    var comparison = VisitComparison.Compute(key, arms, units, categories.Count, scores, settings.Test);
                    comparisons.Add(comparison);
                    VisitTableNotes.ReportIssues(visit, comparison, settings, VisitComparison.NominalDf(settings.Test, arms.Count, categories.Count), testIssues);
                }
                comparisonsByVisit.Add((visit, comparisons));
            }

            rows.Add(new ResultRow(visitKey, visit, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Section));
            rows.Add(new ResultRow($"{visitKey}/n", "n", 1, columns.Select(c =>
                comparisons.FirstOrDefault(x => x.ColumnKey == c.Key) is { } comparison
                    ? PValueCell(c.Key, comparison)
                    : ArmOf(selection, c.Key) is { } arm ? CellFactory.Count(c.Key, n[arm]) : CellFactory.Empty(c.Key)).ToList()));
            for (var j = 0; j < categories.Count; j++)
            {
                var category = categories.Items[j];
                rows.Add(new ResultRow($"{visitKey}/{category.Key}", category.Label, 2, columns.Select(c =>
                    ArmOf(selection, c.Key) is { } arm ? CellFactory.CountPercent(c.Key, counts[arm][j], n[arm], decimals) : CellFactory.Empty(c.Key)).ToList()));
            }
            if (settings.MissingRow)
            {
                rows.Add(new ResultRow($"{visitKey}/{ResultKey.Missing}", "Missing", 2, columns.Select(c =>
                    ArmOf(selection, c.Key) is { } arm ? CellFactory.Count(c.Key, selection.Count(arm) - n[arm]) : CellFactory.Empty(c.Key)).ToList()));
            }
            rows.Add(new ResultRow($"{visitKey}/blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank));
        }
        rows.RemoveAt(rows.Count - 1);

        notes.Add(VisitTableNotes.Denominators(selection, settings));
        notes.Add(VisitTableNotes.Records(endpoint, settings, imputedByVisit));
        if (testing)
        {
            notes.Add(VisitTableNotes.Test(settings, categories, scores, strata, selection, allArms, comparisonsByVisit));
            // Each issue of a single test is printed among the footnotes and raised as a warning.
            notes.AddRange(testIssues.Select((issue, i) => issue with { Id = $"issue-{i + 1}", Role = NoteRole.Footnote }));
            warnings.AddRange(testIssues);
        }
        warnings.AddRange(comparisonsByVisit.SelectMany(v => v.Comparisons
            .Where(c => !c.Test.IsEstimable)
            .Select(c => ResultNote.Warning(NoteKind.PValueNotEstimable, VisitTableNotes.About(v.Visit, c), ("reason", c.Test.NotEstimableReason!)))));
        return new TableResult(table.Id, table.Title, selection.Label, columns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), decimals, statistics.PValueFloor)
        {
            Notes = [.. notes, .. warnings],
        };
    }

    private static TreatmentArm? ArmOf(PopulationSelection selection, string columnKey) =>
        selection.Arms.FirstOrDefault(a => a.Key == columnKey);

    private static StratumKey? Stratum(IReadOnlyList<RecordVariable> strata, int row, string subject)
    {
        if (strata.Count == 0)
        {
            return StratumKey.All;
        }
        var values = strata.Select(s => s.Text(row, subject)).ToList();
        return values.Any(v => v is null) ? null : StratumKey.Of(strata, values!);
    }

    /// <summary>The p-value, with the statistic, its degrees of freedom and the number of strata kept in results.json.</summary>
    private static ResultCell PValueCell(string column, VisitComparison comparison)
    {
        var cell = CellFactory.PValueOf(column, comparison.Test);
        return cell with { Values = [.. cell.Values, StatisticValue.Count(StrataCount, comparison.StrataUsed) with { Method = comparison.Test.Method }] };
    }
}
