using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;

namespace OutputForge.Kinds.Responders;

/// <summary>
/// Binary responder analysis: per arm, responders n (%) of N with a confidence interval for the
/// proportion; per active arm against the control, the difference in proportions with its
/// interval and a p-value (chi-square, or Fisher's exact test for small expected counts); optionally an
/// analysis stratified by ADSL variables and relative risk / odds ratio rows (<see cref="ResponderSettings"/>).
/// </summary>
public sealed class ResponderAnalysis : ITableAnalysis
{
    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var endpoint = table.Endpoint!;
        var reads = EndpointRecords.Reads(table, PopulationSelection.Reads(study, table, new VariableReads()))
            .AddCondition(endpoint.Dataset, endpoint.Response)
            .Add(VariableReads.SubjectLevel, table.Settings<ResponderSettings>().Stratified?.Strata ?? []);
        // Observed cases count the records the dataset derived, where it marks them.
        return endpoint.Missing == MissingResponse.Observed ? reads.AddOptional(endpoint.Dataset, ObservedCases.DerivationVariable) : reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var statistics = table.Statistics;
        var selection = PopulationSelection.Select(study, table, data);
        var records = EndpointRecords.Select(table, data);
        var response = records.CompileResponse(table);
        var missingAreNonResponders = endpoint.Missing == MissingResponse.NonResponder;
        var observedCases = endpoint.Missing == MissingResponse.Observed;

        var counts = selection.Arms.ToDictionary(a => a, a => Count(selection.ArmOfSubject, a, records, response, missingAreNonResponders));
        var columns = selection.Arms.Select(a => new ResultColumn(a.Key, a.Label, selection.Count(a))).ToList();
        var columnCounts = selection.Arms.Select(a => (Key: a.Key, Counts: counts[a])).ToList();
        if (study.Treatment.Total)
        {
            var total = counts.Values.Aggregate((x, y) => x + y);
            columns.Add(new ResultColumn(ResultKey.Total, "Total", total.Population));
            columnCounts.Add((ResultKey.Total, total));
        }

        var proportionMethod = statistics.ProportionInterval;
        var differenceMethod = statistics.DifferenceInterval;
        var level = statistics.Level;
        var decimals = statistics.PercentDecimals;
        var control = selection.Control;
        var comparisons = selection.Arms.Where(a => !a.IsControl)
            .Select(a => ResponderComparison.Compute(a, counts[a], counts[control], differenceMethod, statistics.Level, statistics.Test))
            .ToList();

        var rows = new List<ResultRow>
        {
            Section("endpoint", endpoint.Label ?? DefaultLabel(endpoint), columns),
            new("responders", "Responders, n (%)", 1,
                columnCounts.Select(c => CellFactory.CountPercent(c.Key, c.Counts.Responders, c.Counts.Denominator, decimals)).ToList()),
            new("responders-ci", "{level} CI", 2,
                columnCounts.Select(c => CellFactory.Interval(c.Key,
                    c.Counts.Denominator == 0
                        ? IntervalResult.NotEstimable("no subjects in the denominator")
                        : ProportionInterval.Compute(c.Counts.Responders, c.Counts.Denominator, proportionMethod, statistics.Level),
                    100, decimals, MethodCatalog.Describe(proportionMethod), level)).ToList()) { Level = level, NoteRefs = [ResponderNotes.Proportion] },
            new("nonresponders", "Non-responders, n (%)", 1,
                columnCounts.Select(c => CellFactory.CountPercent(c.Key, c.Counts.NonResponders, c.Counts.Denominator, decimals)).ToList()),
        };
        if (missingAreNonResponders)
        {
            rows.Add(new ResultRow("missing", "No assessment, counted as non-responder, n", 2,
                columnCounts.Select(c => CellFactory.Count(c.Key, c.Counts.Missing)).ToList()));
        }
        else if (observedCases)
        {
            rows.Insert(1, new ResultRow("evaluated", "Subjects with a record (observed cases), n", 1,
                columnCounts.Select(c => CellFactory.Count(c.Key, c.Counts.Evaluated)).ToList()));
            if (ObservedCases.DerivedRecords(selection, records) is { } derived)
            {
                rows.Insert(2, new ResultRow("derived", "Record derived in the dataset (DTYPE), n", 2,
                    columnCounts.Select(c => CellFactory.Count(c.Key, c.Key == ResultKey.Total ? derived.Values.Sum() : derived[c.Key])).ToList()));
            }
            rows.Add(new ResultRow("missing", "No record (left out), n", 1,
                columnCounts.Select(c => CellFactory.Count(c.Key, c.Counts.Missing)).ToList()));
        }
        else
        {
            rows.Insert(1, new ResultRow("evaluated", "Subjects evaluated, n", 1,
                columnCounts.Select(c => CellFactory.Count(c.Key, c.Counts.Evaluated)).ToList()));
            rows.Add(new ResultRow("missing", "No assessment (excluded), n", 1,
                columnCounts.Select(c => CellFactory.Count(c.Key, c.Counts.Missing)).ToList()));
        }
        rows.Add(Blank(columns));
        rows.Add(Section("comparison", $"Comparison with {control.Label}", columns));
        rows.Add(ComparisonRow("difference", "Difference in proportions, %", columns, comparisons,
            c => CellFactory.Estimate(c.Arm.Key, c.Difference, 100, decimals, MethodCatalog.Describe(differenceMethod))) with { NoteRefs = [ResponderNotes.Difference] });
        rows.Add(ComparisonRow("difference-ci", "{level} CI", columns, comparisons,
            c => CellFactory.Interval(c.Arm.Key, c.Difference, 100, decimals, MethodCatalog.Describe(differenceMethod), level))
            with { Level = level, NoteRefs = [ResponderNotes.Difference] });
        rows.Add(ComparisonRow("p-value", "p-value", columns, comparisons, c => CellFactory.PValueOf(c.Arm.Key, c.Test)) with { NoteRefs = [ResponderNotes.Test] });
        var extra = ExtraComparisons(table, selection, data, records, response, missingAreNonResponders, counts, columns, statistics.Level, decimals);
        rows.AddRange(extra?.Rows ?? []);

        var notes = new List<ResultNote>
        {
            ResultNote.Footnote(ResponderNotes.Proportion, NoteKind.ProportionInterval, ("method", MethodCatalog.Describe(proportionMethod)), ("level", level)),
            ResultNote.Footnote(ResponderNotes.Difference, NoteKind.DifferenceInterval, ("method", MethodCatalog.Describe(differenceMethod)),
                ("level", level), ("control", control.Label)),
            TestNote(comparisons, statistics.Test, control),
        };
        notes.AddRange(extra?.Notes ?? []);
        notes.Add(ResultNote.Footnote("denominators", NoteKind.ResponderDenominators, ("population", selection.Label),
            ("missing", endpoint.Missing switch
            {
                MissingResponse.NonResponder => "non-responder",
                MissingResponse.Observed => "observed",
                _ => "exclude",
            }), ("dataset", endpoint.Dataset), ("derivation", ObservedCases.DerivationVariable)));
        var warnings = new List<ResultNote>();
        warnings.AddRange(extra?.Warnings ?? []);
        warnings.AddRange(SmallCountWarnings(comparisons, statistics.Test, control));
        warnings.AddRange(NotEstimableNotes.Of(rows));
        return new TableResult(table.Id, table.Title, selection.Label, columns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), decimals, statistics.PValueFloor)
        {
            Notes = [.. notes, .. warnings],
        };
    }

    /// <summary>The stratified rows and the ratio rows, when the table's "responders" settings ask for them.</summary>
    private static StratifiedAndRatioRows? ExtraComparisons(TableSpec table, PopulationSelection selection, StudyData data,
        EndpointRecords records, Expressions.Condition response, bool missingAreNonResponders,
        IReadOnlyDictionary<TreatmentArm, ResponderCounts> counts, IReadOnlyList<ResultColumn> columns, double level, int decimals)
    {
        var settings = table.Settings<ResponderSettings>();
        if (settings.Stratified is null && settings.Ratios.Count == 0)
        {
            return null;
        }
        var control = selection.Control;
        var actives = selection.Arms.Where(a => !a.IsControl).ToList();
        var withRelativeRisk = settings.Ratios.Contains(RatioMeasure.RelativeRisk);
        OddsRatioIntervalMethod? oddsMethod = settings.Ratios.Contains(RatioMeasure.OddsRatio) ? settings.OddsRatioInterval : null;
        ResponderStrata? strata = null;
        var stratified = new List<StratifiedComparison>();
        var population = new Dictionary<string, int>(StringComparer.Ordinal);
        List<ResponderRatios> ratios;
        if (settings.Stratified is { } spec)
        {
            if (oddsMethod == OddsRatioIntervalMethod.Exact)
            {
                throw new SpecException(table.Source.Problem("/responders/oddsRatioInterval",
                    "the exact conditional interval is for an unstratified odds ratio; a stratified table reports the Mantel-Haenszel odds ratio: use \"woolf\" (Robins-Breslow-Greenland) or remove \"stratified\""));
            }
            strata = ResponderStrata.Build(spec, selection, data, table.Source);
            var subjects = selection.ArmOfSubject
                .Select(p => records.RowOfSubject.TryGetValue(p.Key, out var row)
                    ? new ResponderSubject(p.Key, p.Value, true, response.Matches(row))
                    : new ResponderSubject(p.Key, p.Value, missingAreNonResponders, false))
                .ToList();
            foreach (var stratum in strata.StratumOfSubject.Values)
            {
                population[stratum] = population.GetValueOrDefault(stratum) + 1;
            }
            stratified = actives.Select(a => StratifiedComparison.Compute(a, control, subjects, strata, spec, level, withRelativeRisk, oddsMethod)).ToList();
            ratios = stratified.Select(ResponderRatios.Stratified).ToList();
        }
        else
        {
            ratios = actives.Select(a => ResponderRatios.Unstratified(a, counts[a], counts[control], withRelativeRisk, oddsMethod is not null,
                oddsMethod ?? OddsRatioIntervalMethod.Woolf, level)).ToList();
        }
        return StratifiedAndRatioRows.Build(settings, strata, stratified, ratios, columns, control, level, decimals, population);
    }

    /// <summary>The counts of <paramref name="arm"/> among <paramref name="armOfSubject"/> (the population, or a part of it such as a subgroup).</summary>
    internal static ResponderCounts Count(IEnumerable<KeyValuePair<string, TreatmentArm>> armOfSubject, TreatmentArm arm, EndpointRecords records,
        Expressions.Condition response, bool missingAreNonResponders)
    {
        int population = 0, evaluated = 0, responders = 0;
        foreach (var (subject, subjectArm) in armOfSubject)
        {
            if (subjectArm != arm)
            {
                continue;
            }
            population++;
            if (records.RowOfSubject.TryGetValue(subject, out var row))
            {
                evaluated++;
                if (response.Matches(row))
                {
                    responders++;
                }
            }
        }
        return new ResponderCounts(population, evaluated, responders, missingAreNonResponders);
    }

    private static string DefaultLabel(EndpointSpec endpoint) =>
        string.Join(", ", new[] { endpoint.Parameter, endpoint.Visit }.Where(s => s is not null)) is { Length: > 0 } label
            ? label
            : "Response";

    private static ResultRow Section(string key, string label, IReadOnlyList<ResultColumn> columns) =>
        new(key, label, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Section);

    private static ResultRow Blank(IReadOnlyList<ResultColumn> columns) =>
        new("blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank);

    private static ResultRow ComparisonRow(string key, string label, IReadOnlyList<ResultColumn> columns,
        IReadOnlyList<ResponderComparison> comparisons, Func<ResponderComparison, ResultCell> cell) =>
        new(key, label, 1, columns.Select(column =>
            comparisons.FirstOrDefault(c => c.Arm.Key == column.Key) is { } comparison
                ? cell(comparison)
                : CellFactory.Empty(column.Key)).ToList());

    /// <summary>
    /// The unstratified test's footnote: the test the spec names, or (with "auto") the test each comparison used; a
    /// comparison without a p-value (NE, e.g. against an arm without subjects) used no test and is not named.
    /// </summary>
    private static ResultNote TestNote(IReadOnlyList<ResponderComparison> comparisons, TableTest choice, TreatmentArm control)
    {
        if (choice != TableTest.Auto)
        {
            return ResultNote.Footnote(ResponderNotes.Test, NoteKind.UnstratifiedTest, ("method", NamedTest(choice)));
        }
        var tested = comparisons.Where(c => c.Test.IsEstimable).ToList();
        return ResultNote.Footnote(ResponderNotes.Test, NoteKind.UnstratifiedTest, ("automatic", true),
            ("methods", tested.Select(c => c.Test.Method).ToList()), ("arms", tested.Select(c => c.Arm.Label).ToList()),
            ("allTested", tested.Count == comparisons.Count), ("control", control.Label));
    }

    private static string NamedTest(TableTest choice) => choice switch
    {
        TableTest.Fisher => "Fisher's exact test",
        TableTest.Yates => "Pearson's chi-square test with Yates' continuity correction",
        TableTest.LikelihoodRatio => "the likelihood-ratio chi-square test",
        _ => "Pearson's chi-square test",
    };

    private static IEnumerable<ResultNote> SmallCountWarnings(IReadOnlyList<ResponderComparison> comparisons, TableTest choice, TreatmentArm control)
    {
        // Every large-sample test the spec forces gets Cochran's caution; "auto" switches to Fisher instead.
        if (choice is TableTest.Auto or TableTest.Fisher)
        {
            yield break;
        }
        foreach (var c in comparisons.Where(c => c.Expected.CellsBelowFive > 0))
        {
            yield return ResultNote.Warning(NoteKind.SmallExpectedCounts, new NoteSubject(Arm: c.Arm.Label, Control: control.Label),
                ("below", c.Expected.CellsBelowFive), ("cells", c.Expected.CellCount), ("smallest", c.Expected.MinimumExpected), ("ofCells", true));
        }
    }
}
