using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;
using static OutputForge.Results.StatisticNames;

namespace OutputForge.Kinds.Continuous;

/// <summary>
/// Continuous endpoint by visit: per arm n, mean (SD), median, min and max of the baseline, the value at
/// the visit and the change from baseline; optionally an ANCOVA of the change (see
/// <see cref="ContinuousAncova"/>) with LS means, LS mean differences with SE, CI and p-value, and a
/// dose-response test.
/// </summary>
public sealed class ContinuousAnalysis : ITableAnalysis
{
    private const string CellTextNotEstimable = Layout.CellText.NotEstimable;

    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var settings = table.Settings<ContinuousSettings>();
        var endpoint = table.Endpoint!;
        var reads = PopulationSelection.Reads(study, table, new VariableReads())
            .Add(endpoint.Dataset, [AdamConformance.SubjectVariable, "AVISIT"])
            .Add(endpoint.Dataset, endpoint.Parameter is null ? null : "PARAMCD")
            .AddCondition(endpoint.Dataset, endpoint.Where);
        var model = settings.Model;
        IEnumerable<string?> variables = [settings.Value, settings.Baseline, settings.Change, .. model?.Covariates ?? [], .. model?.Factors ?? [], model?.DoseVariable];
        foreach (var variable in variables.OfType<string>())
        {
            reads.AddRecordOrSubjectLevel(endpoint.Dataset, variable);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<ContinuousSettings>();
        var statistics = table.Statistics;
        var selection = PopulationSelection.Select(study, table, data);
        var records = VisitRecords.Select(table, data);
        var dataset = records.Dataset;
        var value = Summarized(RecordVariable.Find(settings.Value, dataset, data, table.Source, "/continuous/value"), table.Source, "/continuous/value");
        var baseline = settings.Baseline is null ? null : Summarized(RecordVariable.Find(settings.Baseline, dataset, data, table.Source, "/continuous/baseline"), table.Source, "/continuous/baseline");
        var change = settings.Change is null ? null : Summarized(RecordVariable.Find(settings.Change, dataset, data, table.Source, "/continuous/change"), table.Source, "/continuous/change");
        // The model analyses the change from baseline, or the value itself for an endpoint without a baseline.
        var response = change ?? value;
        var model = settings.Model;
        var covariates = model?.Covariates.Select((c, i) => Numeric(RecordVariable.Find(c, dataset, data, table.Source, $"/continuous/model/covariates/{i}"),
            table.Source, $"/continuous/model/covariates/{i}", "list it under \"factors\" to use it as a class covariate")).ToList() ?? [];
        var factors = model?.Factors.Select((f, i) => RecordVariable.Find(f, dataset, data, table.Source, $"/continuous/model/factors/{i}")).ToList() ?? [];
        var dose = model?.DoseVariable is { } doseName
            ? Numeric(RecordVariable.Find(doseName, dataset, data, table.Source, "/continuous/model/doseVariable"), table.Source, "/continuous/model/doseVariable", "the dose-response test needs the dose as a number")
            : null;
        var pairs = model is null ? [] : ResolvePairs(model, selection, table.Source);
        var modelVisits = model is null ? [] : ResolveModelVisits(model, settings, table.Source);

        var columns = selection.Arms.Select(a => new ResultColumn(a.Key, a.Label, selection.Count(a))).ToList();
        var d = settings.Decimals;
        var level = statistics.Level;
        var rows = new List<ResultRow>();
        var warnings = new List<ResultNote>();
        var modelled = new List<(string Visit, ContinuousAncova Ancova)>();
        var control = selection.Control;

        foreach (var visit in settings.Visits.Distinct())
        {
            var visitKey = ResultKey.Part(visit);
            var subjectsOf = SubjectsByArm(selection, records.InRowOrder(visit));
            rows.Add(Section(visitKey, visit, columns));
            if (baseline is not null)
            {
                AddSummary(rows, $"{visitKey}/baseline", "Baseline", baseline, subjectsOf, columns, d);
            }
            AddSummary(rows, $"{visitKey}/value", $"Value at {visit}", value, subjectsOf, columns, d);
            if (change is not null)
            {
                AddSummary(rows, $"{visitKey}/change", "Change from baseline", change, subjectsOf, columns, d);
            }

            if (modelVisits.Contains(visit))
            {
                var candidates = subjectsOf.SelectMany(p => p.Value
                        .Select(s => new ModelObservation(s.Subject, p.Key, s.Row, response.Number(s.Row, s.Subject))))
                    .Where(o => double.IsFinite(o.Response))
                    .ToList();
                var ancova = ContinuousAncova.Fit(selection.Arms, candidates, covariates, factors, dose, pairs, statistics.Level);
                modelled.Add((visit, ancova));
                AddModelRows(rows, visitKey, ancova, columns, selection, d, level, change is null ? "value" : "change from baseline");
                if (ancova.NotEstimableReason is not null)
                {
                    warnings.Add(ResultNote.Warning(NoteKind.ModelNotFitted, new NoteSubject(Visit: visit),
                        ("model", "ANCOVA"), ("reason", ancova.NotEstimableReason)));
                }
                else if (ancova.DoseNotEstimableReason is not null)
                {
                    warnings.Add(ResultNote.Warning(NoteKind.ModelNotFitted, new NoteSubject(Visit: visit),
                        ("model", "dose-response model"), ("reason", ancova.DoseNotEstimableReason)));
                }
                foreach (var arm in selection.Arms.Where(a => ancova.CountInModel[a] == 0 && ancova.NotEstimableReason is null))
                {
                    warnings.Add(ResultNote.Warning(NoteKind.ArmNotInModel, new NoteSubject(Visit: visit, Arm: arm.Label), ("response", response.Name)));
                }
            }
            rows.Add(Blank(visitKey, columns));
        }
        rows.RemoveAt(rows.Count - 1);

        var notes = new List<ResultNote>
        {
            ResultNote.Footnote("denominators", NoteKind.VisitDenominators, ("population", selection.Label)),
        };
        if (model is not null)
        {
            notes.Add(ModelNote(model, response.Name, level, control, modelled));
            if (dose is not null)
            {
                notes.Add(ResultNote.Footnote(DoseResponseNote, NoteKind.DoseResponseTest, ("dose", dose.Name)));
            }
        }
        warnings.AddRange(NotEstimableNotes.Of(rows));
        return new TableResult(table.Id, table.Title, selection.Label, columns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), statistics.PercentDecimals, statistics.PValueFloor)
        {
            Notes = [.. notes, .. warnings],
        };
    }

    /// <summary>The subjects of each arm with a record at the visit, in record order, from one pass over the visit's records.</summary>
    private static Dictionary<TreatmentArm, List<(string Subject, int Row)>> SubjectsByArm(PopulationSelection selection,
        IReadOnlyList<(string Subject, int Row)> records)
    {
        var subjectsOf = selection.Arms.ToDictionary(a => a, _ => new List<(string Subject, int Row)>());
        foreach (var (subject, row) in records)
        {
            if (selection.ArmOfSubject.TryGetValue(subject, out var arm) && subjectsOf.TryGetValue(arm, out var subjects))
            {
                subjects.Add((subject, row));
            }
        }
        return subjectsOf;
    }

    private static RecordVariable Numeric(RecordVariable variable, SpecSource source, string pointer, string hint) =>
        variable.IsNumeric ? variable : throw new SpecException(source.Problem(pointer,
            $"{variable.Name} in {variable.DatasetFile} is not numeric{variable.NotNumericEvidence}; {hint}"));

    /// <summary>A summarized variable must hold numbers (a text value would silently leave the summaries); an empty column has n = 0.</summary>
    private static RecordVariable Summarized(RecordVariable variable, SpecSource source, string pointer) =>
        variable.IsNumeric || variable.IsEmpty ? variable : Numeric(variable, source, pointer, "a continuous summary needs numbers");

    private static void AddSummary(List<ResultRow> rows, string key, string label, RecordVariable variable,
        Dictionary<TreatmentArm, List<(string Subject, int Row)>> subjectsOf, IReadOnlyList<ResultColumn> columns, int d)
    {
        var summaries = subjectsOf.ToDictionary(p => p.Key.Key, p => DescriptiveStatistics.Compute(FiniteValues(variable, p.Value),
            geometricMean: false));
        rows.Add(new ResultRow(key, label, 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
        rows.Add(new ResultRow($"{key}/n", "n", 2, columns.Select(c => CellFactory.Count(c.Key, summaries[c.Key].N)).ToList()));
        rows.Add(new ResultRow($"{key}/mean-sd", "Mean (SD)", 2, columns.Select(c => Cell(c.Key, "{mean} ({sd})", summaries[c.Key],
            (Mean, s => s.Mean, d + 1), (StandardDeviation, s => s.StandardDeviation, d + 2))).ToList()));
        rows.Add(new ResultRow($"{key}/median", "Median", 2, columns.Select(c => Cell(c.Key, "{median}", summaries[c.Key],
            (Median, s => s.Median, d + 1))).ToList()));
        rows.Add(new ResultRow($"{key}/min-max", "Min, Max", 2, columns.Select(c => Cell(c.Key, "{min}, {max}", summaries[c.Key],
            (Minimum, s => s.Minimum, d), (Maximum, s => s.Maximum, d))).ToList()));
    }

    /// <summary>The variable's non-missing values over the records, in record order.</summary>
    private static List<double> FiniteValues(RecordVariable variable, List<(string Subject, int Row)> records)
    {
        var values = new List<double>(records.Count);
        foreach (var (subject, row) in records)
        {
            var value = variable.Number(row, subject);
            if (double.IsFinite(value))
            {
                values.Add(value);
            }
        }
        return values;
    }

    private static ResultCell Cell(string column, string pattern, DescriptiveSummary summary,
        params (string Name, Func<DescriptiveSummary, double?> Get, int Decimals)[] parts)
    {
        if (summary.N == 0)
        {
            return CellFactory.Empty(column);
        }
        // A value that cannot be computed (the SD of one value) prints as NE inside the cell, the rest stays.
        foreach (var part in parts.Where(p => p.Get(summary) is null))
        {
            pattern = pattern.Replace("{" + part.Name + "}", CellTextNotEstimable, StringComparison.Ordinal);
        }
        return new ResultCell(column, pattern, parts.Select(p => p.Get(summary) is { } v
            ? new StatisticValue(p.Name, v, ValueFormat.Decimal, p.Decimals)
            : StatisticValue.NotEstimable(p.Name, ValueFormat.Decimal, (summary.Notes.FirstOrDefault() ?? "not computable").TrimEnd('.'))).ToList());
    }

    private static void AddModelRows(List<ResultRow> rows, string visitKey, ContinuousAncova ancova, IReadOnlyList<ResultColumn> columns,
        PopulationSelection selection, int d, double level, string analysed)
    {
        var armOfColumn = selection.Arms.ToDictionary(a => a.Key);
        var control = selection.Control;
        rows.Add(new ResultRow($"{visitKey}/ancova", $"ANCOVA of {analysed}", 1, columns.Select(c => CellFactory.Empty(c.Key)).ToList())
        {
            NoteRefs = [AncovaNote],
        });
        rows.Add(new ResultRow($"{visitKey}/model-n", "n in model", 2,
            columns.Select(c => CellFactory.Count(c.Key, ancova.CountInModel[armOfColumn[c.Key]])).ToList()));
        rows.Add(new ResultRow($"{visitKey}/lsmean", "LS mean (SE)", 2, columns.Select(c =>
            ancova.LsMeans.TryGetValue(armOfColumn[c.Key], out var m)
                ? EstimateWithError(c.Key, m, d, level)
                : NotEstimable(c.Key, "{estimate} ({se})", ancova.NotEstimableReason ?? "no subjects of this arm in the model")).ToList()));
        var vsControl = ancova.Comparisons.Where(x => x.Reference == control).ToList();
        AddComparisonRows(rows, $"{visitKey}/lsdiff", $"Difference vs {control.Label}", vsControl, columns, d, level, 2);
        foreach (var pair in ancova.Comparisons.Where(x => x.Reference != control))
        {
            AddComparisonRows(rows, $"{visitKey}/lsdiff-{pair.Arm.Key}-vs-{pair.Reference.Key}", $"{pair.Arm.Label} vs {pair.Reference.Label}",
                [pair], columns, d, level, 2);
        }
        if (ancova.DoseSlope is not null || ancova.DoseNotEstimableReason is not null)
        {
            var method = "t test of the dose slope";
            rows.Add(new ResultRow($"{visitKey}/dose-response", "Dose-response test p-value", 2, columns.Select(c =>
                c.Key != control.Key
                    ? CellFactory.Empty(c.Key)
                    : ancova.DoseSlope is { } slope
                        ? new ResultCell(c.Key, "{pValue}",
                        [
                            new StatisticValue(PValue, slope.PValue, ValueFormat.PValue, Method: method) { Sided = Sidedness.TwoSided },
                            new StatisticValue(Estimate, slope.Estimate, ValueFormat.Decimal, d + 3, Method: method),
                            new StatisticValue(StandardError, slope.StandardError, ValueFormat.Decimal, d + 3, Method: method),
                            new StatisticValue(TestStatistic, slope.T, ValueFormat.Decimal, 3, Method: method),
                            new StatisticValue(DegreesOfFreedom, slope.DegreesOfFreedom, ValueFormat.Decimal, 0, Method: method),
                        ])
                        : NotEstimable(c.Key, "{pValue}", ancova.DoseNotEstimableReason!)).ToList())
            {
                NoteRefs = [DoseResponseNote],
            });
        }
    }

    private static void AddComparisonRows(List<ResultRow> rows, string key, string label, IReadOnlyList<ContinuousAncova.Comparison> comparisons,
        IReadOnlyList<ResultColumn> columns, int d, double level, int indent)
    {
        ResultCell CellOf(string column, Func<LinearContrastResult, ResultCell> make, string pattern)
        {
            var comparison = comparisons.FirstOrDefault(x => x.Arm.Key == column);
            return comparison is null ? CellFactory.Empty(column)
                : comparison.Result is { } r ? make(r)
                : NotEstimable(column, pattern, comparison.NotEstimableReason!);
        }
        const string method = "LS mean difference (ANCOVA)";
        rows.Add(new ResultRow($"{key}-label", label, indent, columns.Select(c => CellFactory.Empty(c.Key)).ToList()));
        indent++;
        rows.Add(new ResultRow(key, "LS mean difference (SE)", indent,
            columns.Select(c => CellOf(c.Key, r => EstimateWithError(c.Key, r, d, level), "{estimate} ({se})")).ToList()));
        rows.Add(new ResultRow($"{key}-ci", "{level} CI", indent, columns.Select(c => CellOf(c.Key, r => new ResultCell(c.Key, "({lower}, {upper})",
        [
            new StatisticValue(Lower, r.Lower, ValueFormat.Decimal, d + 1, Method: method) { Level = level, Sided = Sidedness.TwoSided },
            new StatisticValue(Upper, r.Upper, ValueFormat.Decimal, d + 1, Method: method) { Level = level, Sided = Sidedness.TwoSided },
        ]), "({lower}, {upper})")).ToList())
        {
            Level = level,
        });
        rows.Add(new ResultRow($"{key}-p-value", "p-value", indent, columns.Select(c => CellOf(c.Key, r => new ResultCell(c.Key, "{pValue}",
        [
            new StatisticValue(PValue, r.PValue, ValueFormat.PValue, Method: method) { Sided = Sidedness.TwoSided },
            new StatisticValue(TestStatistic, r.T, ValueFormat.Decimal, 3, Method: method),
            new StatisticValue(DegreesOfFreedom, r.DegreesOfFreedom, ValueFormat.Decimal, 0, Method: method),
        ]), "{pValue}")).ToList()));
    }

    /// <summary>An estimate with its standard error shown, and its interval's bounds at <paramref name="level"/> kept in the results.</summary>
    private static ResultCell EstimateWithError(string column, LinearContrastResult r, int d, double level) =>
        new(column, "{estimate} ({se})",
        [
            new StatisticValue(Estimate, r.Estimate, ValueFormat.Decimal, d + 1),
            new StatisticValue(StandardError, r.StandardError, ValueFormat.Decimal, d + 2),
            new StatisticValue(Lower, r.Lower, ValueFormat.Decimal, d + 1) { Level = level, Sided = Sidedness.TwoSided },
            new StatisticValue(Upper, r.Upper, ValueFormat.Decimal, d + 1) { Level = level, Sided = Sidedness.TwoSided },
        ]);

    private static ResultCell NotEstimable(string column, string pattern, string reason) =>
        new(column, pattern.Contains("{pValue}") ? "{pValue}" : pattern.Contains("{lower}") ? "{lower}" : "{estimate}",
        [
            StatisticValue.NotEstimable(pattern.Contains("{pValue}") ? PValue : pattern.Contains("{lower}") ? Lower : Estimate,
                pattern.Contains("{pValue}") ? ValueFormat.PValue : ValueFormat.Decimal, reason),
        ]);

    private const string AncovaNote = "ancova";

    private const string DoseResponseNote = "dose-response";

    private static ResultNote ModelNote(ContinuousModelSettings model, string response, double level, TreatmentArm control,
        IReadOnlyList<(string Visit, ContinuousAncova Ancova)> modelled)
    {
        var excluded = modelled.Where(m => m.Ancova.Excluded > 0).ToList();
        return ResultNote.Footnote(AncovaNote, NoteKind.AncovaModel, ("response", response), ("covariates", model.Covariates.ToList()),
            ("factors", model.Factors.ToList()), ("control", control.Label), ("level", level),
            ("excludedVisits", excluded.Select(m => m.Visit).ToList()), ("excludedCounts", excluded.Select(m => m.Ancova.Excluded).ToList()));
    }

    private static List<(TreatmentArm First, TreatmentArm Second)> ResolvePairs(ContinuousModelSettings model, PopulationSelection selection, SpecSource source)
    {
        var byValue = selection.Arms.ToDictionary(a => a.Value, StringComparer.Ordinal);
        var values = byValue.Keys.ToList();
        return model.Pairs.Select((pair, i) =>
        {
            TreatmentArm Arm(int j) => byValue.TryGetValue(pair[j], out var arm) ? arm : throw new SpecException(source.Problem(
                $"/continuous/model/pairs/{i}/{j}", $"'{pair[j]}' is not an arm of the population{NearestName.Hint(pair[j], values)}"));
            var first = Arm(0);
            var second = Arm(1);
            if (first == second)
            {
                throw new SpecException(source.Problem($"/continuous/model/pairs/{i}", "a pair compares an arm with itself"));
            }
            return (first, second);
        }).ToList();
    }

    private static HashSet<string> ResolveModelVisits(ContinuousModelSettings model, ContinuousSettings settings, SpecSource source)
    {
        if (model.Visits is null)
        {
            return settings.Visits.ToHashSet(StringComparer.Ordinal);
        }
        for (var i = 0; i < model.Visits.Count; i++)
        {
            if (!settings.Visits.Contains(model.Visits[i], StringComparer.Ordinal))
            {
                throw new SpecException(source.Problem($"/continuous/model/visits/{i}",
                    $"'{model.Visits[i]}' is not one of the table's visits{NearestName.Hint(model.Visits[i], settings.Visits)}"));
            }
        }
        return model.Visits.ToHashSet(StringComparer.Ordinal);
    }

    private static ResultRow Section(string key, string label, IReadOnlyList<ResultColumn> columns) =>
        new(key, label, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Section);

    private static ResultRow Blank(string key, IReadOnlyList<ResultColumn> columns) =>
        new($"{key}/blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank);
}
