using System.Globalization;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Kinds.TimeToEvent;

/// <summary>
/// Time to event (ADTTE, CNSR 1 = censored): per arm the subjects with an event and censored, the
/// Kaplan-Meier median with its Brookmeyer-Crowley interval (log-log), Kaplan-Meier estimates at the
/// spec's times; per active arm against the control the log-rank p-value and the Cox hazard ratio
/// with its Wald interval (<see cref="TimeToEventComparison"/>).
/// </summary>
public sealed class TimeToEventAnalysis : ITableAnalysis
{
    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var settings = table.Settings<TimeToEventSettings>();
        var dataset = table.Endpoint!.Dataset;
        var reads = EndpointRecords.Reads(table, PopulationSelection.Reads(study, table, new VariableReads()));
        foreach (var variable in settings.Strata.Prepend(settings.Censor).Prepend(settings.Time))
        {
            reads.AddRecordOrSubjectLevel(dataset, variable);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<TimeToEventSettings>();
        var statistics = table.Statistics;
        var selection = PopulationSelection.Select(study, table, data);
        var records = EndpointRecords.Select(table, data);
        var dataset = records.Dataset;
        var time = RecordVariable.Find(settings.Time, dataset, data, table.Source, "/timeToEvent/time");
        var censor = RecordVariable.Find(settings.Censor, dataset, data, table.Source, "/timeToEvent/censor");
        var strata = settings.Strata.Select((s, i) => RecordVariable.Find(s, dataset, data, table.Source, $"/timeToEvent/strata/{i}")).ToList();
        var ties = settings.Ties;
        var warnings = new List<string>(selection.Warnings);

        var subjects = new List<TimeToEventSubject>();
        var missingStratum = 0;
        foreach (var (subject, arm) in selection.ArmOfSubject)
        {
            if (!records.RowOfSubject.TryGetValue(subject, out var row))
            {
                continue;
            }
            var t = time.Number(row, subject);
            var c = censor.Number(row, subject);
            if (!double.IsFinite(t) || t < 0 || (c != 0 && c != 1))
            {
                throw new SpecException(table.Source.Problem("/endpoint",
                    $"subject {subject} ({Path.GetFileName(dataset.File)} line {dataset.LineOfRow[row]}) has {settings.Time} '{time.Text(row, subject)}' and {settings.Censor} '{censor.Text(row, subject)}'; a time-to-event record needs a time of at least 0 and {settings.Censor} 0 (event) or 1 (censored)"));
            }
            string? stratum = null;
            if (strata.Count > 0)
            {
                var values = strata.Select(s => s.Text(row, subject)).ToList();
                if (values.Any(v => v is null))
                {
                    missingStratum++;
                    continue;
                }
                stratum = string.Join(" / ", values);
            }
            subjects.Add(new TimeToEventSubject(subject, arm, t, c == 0, stratum));
        }
        subjects.Sort((a, b) => string.CompareOrdinal(a.Subject, b.Subject));
        if (missingStratum > 0)
        {
            warnings.Add($"{missingStratum} subject{(missingStratum == 1 ? " has" : "s have")} no value of {string.Join(", ", settings.Strata)} and {(missingStratum == 1 ? "is" : "are")} left out of the whole table.");
        }

        var columns = selection.Arms.Select(a => new ResultColumn(a.Key, a.Label, selection.Count(a))).ToList();
        var curves = selection.Arms.ToDictionary(a => a, a =>
        {
            var own = subjects.Where(s => s.Arm == a).ToList();
            return KaplanMeierEstimate.Compute(new SurvivalData(own.Select(s => s.Time).ToList(), own.Select(s => s.Event).ToList()), statistics.Level);
        });
        var control = selection.Control;
        var comparisons = selection.Arms.Where(a => !a.IsControl)
            .Select(a => TimeToEventComparison.Compute(a, control, subjects, strata.Count > 0, ties, statistics.Level))
            .ToList();
        var level = MethodCatalog.LevelText(statistics.Level);
        var percent = statistics.PercentDecimals;
        var d = settings.Decimals;
        var cumulative = settings.Estimate == SurvivalEstimate.Event;

        var rows = new List<ResultRow>
        {
            Section("endpoint", endpoint.Label ?? endpoint.Parameter ?? "Time to event", columns),
            new("analysed", "Subjects analysed, n", 1, columns.Select(c => CellFactory.Count(c.Key, curves[Arm(selection, c)].Count)).ToList()),
            new("events", "Subjects with event, n (%)", 1, columns.Select(c =>
                CellFactory.CountPercent(c.Key, curves[Arm(selection, c)].EventCount, curves[Arm(selection, c)].Count, percent)).ToList()),
            new("censored", "Censored, n (%)", 1, columns.Select(c =>
                CellFactory.CountPercent(c.Key, curves[Arm(selection, c)].Count - curves[Arm(selection, c)].EventCount, curves[Arm(selection, c)].Count, percent)).ToList()),
        };
        var withoutRecord = selection.Arms.ToDictionary(a => a, a => selection.Count(a) - subjects.Count(s => s.Arm == a));
        if (withoutRecord.Values.Any(n => n > 0))
        {
            rows.Add(new ResultRow("no-record", "No record (not analysed), n", 1,
                columns.Select(c => CellFactory.Count(c.Key, withoutRecord[Arm(selection, c)])).ToList()));
        }
        rows.Add(new ResultRow("km", $"Kaplan-Meier estimate of time to event ({settings.Unit}) [a]", 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
        var medians = selection.Arms.ToDictionary(a => a, a => curves[a].Median());
        rows.Add(new ResultRow("median", "Median", 2, columns.Select(c => MedianCell(c.Key, medians[Arm(selection, c)], curves[Arm(selection, c)], d)).ToList()));
        rows.Add(new ResultRow("median-ci", $"{level} CI", 2, columns.Select(c => MedianIntervalCell(c.Key, medians[Arm(selection, c)], curves[Arm(selection, c)], d)).ToList()));

        var timeLabels = settings.TimeLabels;
        if (settings.Times.Count > 0)
        {
            var what = cumulative ? "Probability of event by time, % (95% CI) [b]" : "Event-free probability, % (95% CI) [b]";
            rows.Add(new ResultRow("km-estimates", what.Replace("95%", level, StringComparison.Ordinal), 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
            for (var i = 0; i < settings.Times.Count; i++)
            {
                var t = settings.Times[i];
                var label = timeLabels is not null && i < timeLabels.Count ? timeLabels[i] : "Day " + t.ToString("0.###", CultureInfo.InvariantCulture);
                rows.Add(new ResultRow("km-at-" + ResultKeys.FromLabel(t.ToString("0.###", CultureInfo.InvariantCulture)), label, 2,
                    columns.Select(c => EstimateAtCell(c.Key, curves[Arm(selection, c)].At(t), cumulative, percent)).ToList()));
            }
        }
        rows.Add(new ResultRow("blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank));
        rows.Add(Section("comparison", $"Comparison with {control.Label}", columns));
        rows.Add(ComparisonRow("log-rank", $"Log-rank test p-value [c]", columns, comparisons, c => CellFactory.PValueOf(c.Arm.Key, c.LogRank)));
        var coxMethod = $"Cox proportional hazards, {(ties == CoxTies.Efron ? "Efron" : "Breslow")} ties";
        rows.Add(ComparisonRow("hazard-ratio", "Hazard ratio [d]", columns, comparisons,
            c => CellFactory.Estimate(c.Arm.Key, c.HazardRatio, 1, settings.HazardRatioDecimals, coxMethod)));
        rows.Add(ComparisonRow("hazard-ratio-ci", $"{level} CI", columns, comparisons,
            c => CellFactory.Interval(c.Arm.Key, c.HazardRatio, 1, settings.HazardRatioDecimals, coxMethod)));

        var strataText = settings.Strata.Count > 0 ? $"stratified by {string.Join(" and ", settings.Strata)}" : "unstratified";
        var notes = new List<string>
        {
            $"Time in {settings.Unit}; {settings.Censor} = 1 marks a censored time. Percentages are of the subjects analysed.",
            $"[a] Kaplan-Meier product-limit estimate; {level} CI of the median by the method of Brookmeyer and Crowley with the log-log transformation. NE: not reached (the curve or its confidence limit does not fall to 50%).",
            $"[c] Two-sided p-value of the log-rank test, {strataText}, of each arm against {control.Label} (those two arms only).",
            $"[d] Hazard ratio (arm vs {control.Label}) from a Cox proportional hazards model with treatment as the only covariate, {strataText}, fitted to the two arms compared; {(ties == CoxTies.Efron ? "Efron" : "Breslow")} method for tied times; Wald {level} CI. " +
                (cumulative ? $"A hazard ratio above 1 means the event comes sooner than on {control.Label}." : $"A hazard ratio below 1 means a lower event rate than on {control.Label}."),
        };
        if (settings.Times.Count > 0)
        {
            notes.Insert(2, cumulative
                ? $"[b] 100 x (1 - S(t)) from the Kaplan-Meier curve with the log-log {level} CI of S(t), complemented; NE beyond the arm's last observed time."
                : $"[b] 100 x S(t) from the Kaplan-Meier curve with the log-log {level} CI (Greenwood variance); NE beyond the arm's last observed time.");
        }
        foreach (var c in comparisons)
        {
            warnings.AddRange(c.LogRank.Notes.Select(n => $"{c.Arm.Label} vs {control.Label}, log-rank test: {n}."));
            if (!c.HazardRatio.IsEstimable)
            {
                warnings.Add($"{c.Arm.Label} vs {control.Label}: the Cox model gives no hazard ratio: {c.HazardRatio.NotEstimableReason}.");
            }
        }
        // A median or bound "not reached" is explained by note [a]; it is a property of the data, not a failure.
        warnings.AddRange(NotEstimableWarnings(rows.Where(r => r.Key is not ("median" or "median-ci"))));
        return new TableResult(table.Id, table.Title, selection.Label, columns, rows, notes, warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), percent, statistics.PValueFloor);
    }

    private static TreatmentArm Arm(PopulationSelection selection, ResultColumn column) => selection.Arms.First(a => a.Key == column.Key);

    private const string Method = "Kaplan-Meier, Brookmeyer-Crowley log-log CI";

    private static ResultCell MedianCell(string column, KaplanMeierQuantile median, KaplanMeierEstimate curve, int d) =>
        median.Estimate is { } m
            ? new ResultCell(column, "{median}", [new StatisticValue(Median, m, ValueFormat.Decimal, d, Method: Method)])
            : new ResultCell(column, "{median}", [StatisticValue.NotEstimable(Median, ValueFormat.Decimal,
                curve.Count == 0 ? "no subjects" : "the median is not reached", Method)]);

    /// <summary>"(lower, upper)", with NE standing in for a bound the confidence curve never reaches.</summary>
    private static ResultCell MedianIntervalCell(string column, KaplanMeierQuantile median, KaplanMeierEstimate curve, int d)
    {
        if (curve.Count == 0)
        {
            return new ResultCell(column, "{lower}", [StatisticValue.NotEstimable(Lower, ValueFormat.Decimal, "no subjects", Method)]);
        }
        StatisticValue Bound(string name, double? value) => value is { } v
            ? new StatisticValue(name, v, ValueFormat.Decimal, d, Method: Method)
            : StatisticValue.NotEstimable(name, ValueFormat.Decimal, $"the {(name == Lower ? "lower" : "upper")} confidence limit of the median is not reached", Method);
        var pattern = $"({(median.Lower is null ? Layout.CellText.NotEstimable : "{lower}")}, {(median.Upper is null ? Layout.CellText.NotEstimable : "{upper}")})";
        return new ResultCell(column, pattern, [Bound(Lower, median.Lower), Bound(Upper, median.Upper)]);
    }

    private static ResultCell EstimateAtCell(string column, IntervalResult at, bool cumulative, int decimals)
    {
        const string method = "Kaplan-Meier, log-log CI";
        if (!at.IsEstimable)
        {
            return new ResultCell(column, "{estimate}", [StatisticValue.NotEstimable(Estimate, ValueFormat.Percent, at.NotEstimableReason!, method)]);
        }
        var (estimate, lower, upper) = cumulative ? (1 - at.Estimate, 1 - at.Upper, 1 - at.Lower) : (at.Estimate, at.Lower, at.Upper);
        return new ResultCell(column, "{estimate} ({lower}, {upper})",
        [
            new StatisticValue(Estimate, 100 * estimate, ValueFormat.Percent, decimals, Method: method),
            new StatisticValue(Lower, 100 * lower, ValueFormat.Percent, decimals, Method: method),
            new StatisticValue(Upper, 100 * upper, ValueFormat.Percent, decimals, Method: method),
        ]);
    }

    private static ResultRow Section(string key, string label, IReadOnlyList<ResultColumn> columns) =>
        new(key, label, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Section);

    private static ResultRow ComparisonRow(string key, string label, IReadOnlyList<ResultColumn> columns,
        IReadOnlyList<TimeToEventComparison> comparisons, Func<TimeToEventComparison, ResultCell> cell) =>
        new(key, label, 1, columns.Select(column =>
            comparisons.FirstOrDefault(c => c.Arm.Key == column.Key) is { } comparison
                ? cell(comparison)
                : CellFactory.Empty(column.Key)).ToList());

    private static IEnumerable<string> NotEstimableWarnings(IEnumerable<ResultRow> rows) =>
        rows.SelectMany(r => r.Cells.SelectMany(c => c.Values
                .Where(v => v.NotEstimableReason is not null)
                .Select(v => $"NE (not estimable) in \"{r.Label}\", column {c.Column}: {v.NotEstimableReason}.")))
            .Distinct();
}
