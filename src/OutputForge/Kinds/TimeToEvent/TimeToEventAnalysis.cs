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
        var warnings = new List<ResultNote>();

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
            warnings.Add(ResultNote.Warning(NoteKind.NoStratumValue, NoteSubject.None, ("subjects", missingStratum), ("variables", settings.Strata.ToList())));
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
        var level = statistics.Level;
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
        rows.Add(new ResultRow("km", $"Kaplan-Meier estimate of time to event ({settings.Unit})", 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList())
        {
            NoteRefs = [MedianNote],
        });
        var medians = selection.Arms.ToDictionary(a => a, a => curves[a].Median());
        rows.Add(new ResultRow("median", "Median", 2, columns.Select(c => MedianCell(c.Key, medians[Arm(selection, c)], curves[Arm(selection, c)], d)).ToList()));
        rows.Add(new ResultRow("median-ci", "{level} CI", 2, columns.Select(c => MedianIntervalCell(c.Key, medians[Arm(selection, c)], curves[Arm(selection, c)], d, level)).ToList())
        {
            Level = level,
        });

        var timeLabels = settings.TimeLabels;
        if (settings.Times.Count > 0)
        {
            var what = cumulative ? "Probability of event by time, % ({level} CI)" : "Event-free probability, % ({level} CI)";
            rows.Add(new ResultRow("km-estimates", what, 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList())
            {
                Level = level,
                NoteRefs = [SurvivalAtNote],
            });
            for (var i = 0; i < settings.Times.Count; i++)
            {
                var t = settings.Times[i];
                var label = timeLabels is not null && i < timeLabels.Count ? timeLabels[i] : "Day " + t.ToString("0.###", CultureInfo.InvariantCulture);
                rows.Add(new ResultRow("km-at-" + ResultKey.Part(t.ToString("0.###", CultureInfo.InvariantCulture)), label, 2,
                    columns.Select(c => EstimateAtCell(c.Key, curves[Arm(selection, c)].At(t), cumulative, percent, level)).ToList()));
            }
        }
        rows.Add(new ResultRow("blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank));
        rows.Add(Section("comparison", $"Comparison with {control.Label}", columns));
        rows.Add(ComparisonRow("log-rank", "Log-rank test p-value", columns, comparisons, c => CellFactory.PValueOf(c.Arm.Key, c.LogRank)) with
        {
            NoteRefs = [LogRankNote],
        });
        var coxMethod = $"Cox proportional hazards, {(ties == CoxTies.Efron ? "Efron" : "Breslow")} ties";
        rows.Add(ComparisonRow("hazard-ratio", "Hazard ratio", columns, comparisons,
            c => CellFactory.Estimate(c.Arm.Key, c.HazardRatio, 1, settings.HazardRatioDecimals, coxMethod)) with
        {
            NoteRefs = [HazardRatioNote],
        });
        rows.Add(ComparisonRow("hazard-ratio-ci", "{level} CI", columns, comparisons,
            c => CellFactory.Interval(c.Arm.Key, c.HazardRatio, 1, settings.HazardRatioDecimals, coxMethod, level)) with
        {
            Level = level,
        });

        var stratification = settings.Strata.ToList();
        var notes = new List<ResultNote>
        {
            ResultNote.Footnote("time-units", NoteKind.TimeUnits, ("unit", settings.Unit), ("censor", settings.Censor)),
            ResultNote.Footnote(MedianNote, NoteKind.KaplanMeierMedian, ("level", level)),
        };
        if (settings.Times.Count > 0)
        {
            notes.Add(ResultNote.Footnote(SurvivalAtNote, NoteKind.KaplanMeierAtTimes, ("level", level), ("cumulative", cumulative)));
        }
        notes.Add(ResultNote.Footnote(LogRankNote, NoteKind.LogRankTest, ("strata", stratification), ("control", control.Label)));
        notes.Add(ResultNote.Footnote(HazardRatioNote, NoteKind.CoxHazardRatio, ("strata", stratification), ("control", control.Label),
            ("ties", ties == CoxTies.Efron ? "Efron" : "Breslow"), ("level", level), ("cumulative", cumulative)));
        foreach (var c in comparisons)
        {
            warnings.AddRange(c.LogRank.StratumRemarks.Select(r => ResultNote.Warning(NoteKind.StratumAddsNothing,
                new NoteSubject(What: "log-rank test", Arm: c.Arm.Label, Control: control.Label, Stratum: [c.Strata[r.Stratum]]),
                ("reason", StratumReasons.Code(r.Reason)))));
            if (!c.HazardRatio.IsEstimable)
            {
                warnings.Add(ResultNote.Warning(NoteKind.NoHazardRatio, new NoteSubject(Arm: c.Arm.Label, Control: control.Label),
                    ("reason", c.HazardRatio.NotEstimableReason!)));
            }
        }
        // A median or bound "not reached" is explained by the median's footnote; it is a property of the data, not a failure.
        warnings.AddRange(NotEstimableNotes.Of(rows.Where(r => r.Key is not ("median" or "median-ci"))));
        return new TableResult(table.Id, table.Title, selection.Label, columns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), percent, statistics.PValueFloor)
        {
            Notes = [.. notes, .. warnings],
        };
    }

    private static TreatmentArm Arm(PopulationSelection selection, ResultColumn column) => selection.Arms.First(a => a.Key == column.Key);

    private const string Method = "Kaplan-Meier, Brookmeyer-Crowley log-log CI";

    private const string MedianNote = "km-median";
    private const string SurvivalAtNote = "km-at-times";
    private const string LogRankNote = "log-rank";
    private const string HazardRatioNote = "hazard-ratio";

    private static ResultCell MedianCell(string column, KaplanMeierQuantile median, KaplanMeierEstimate curve, int d) =>
        median.Estimate is { } m
            ? new ResultCell(column, "{median}", [new StatisticValue(Median, m, ValueFormat.Decimal, d, Method: Method)])
            : new ResultCell(column, "{median}", [StatisticValue.NotEstimable(Median, ValueFormat.Decimal,
                curve.Count == 0 ? "no subjects" : "the median is not reached", Method)]);

    /// <summary>"(lower, upper)", with NE standing in for a bound the confidence curve never reaches.</summary>
    private static ResultCell MedianIntervalCell(string column, KaplanMeierQuantile median, KaplanMeierEstimate curve, int d, double level)
    {
        if (curve.Count == 0)
        {
            return new ResultCell(column, "{lower}", [StatisticValue.NotEstimable(Lower, ValueFormat.Decimal, "no subjects", Method)]);
        }
        StatisticValue Bound(string name, double? value) => (value is { } v
            ? new StatisticValue(name, v, ValueFormat.Decimal, d, Method: Method)
            : StatisticValue.NotEstimable(name, ValueFormat.Decimal, $"the {(name == Lower ? "lower" : "upper")} confidence limit of the median is not reached", Method))
            with { Level = level, Sided = Sidedness.TwoSided };
        var pattern = $"({(median.Lower is null ? Layout.CellText.NotEstimable : "{lower}")}, {(median.Upper is null ? Layout.CellText.NotEstimable : "{upper}")})";
        return new ResultCell(column, pattern, [Bound(Lower, median.Lower), Bound(Upper, median.Upper)]);
    }

    private static ResultCell EstimateAtCell(string column, IntervalResult at, bool cumulative, int decimals, double level)
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
            new StatisticValue(Lower, 100 * lower, ValueFormat.Percent, decimals, Method: method) { Level = level, Sided = Sidedness.TwoSided },
            new StatisticValue(Upper, 100 * upper, ValueFormat.Percent, decimals, Method: method) { Level = level, Sided = Sidedness.TwoSided },
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
}
