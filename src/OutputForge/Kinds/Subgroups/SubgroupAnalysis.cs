using System.Globalization;
using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Kinds.Responders;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;

namespace OutputForge.Kinds.Subgroups;

/// <summary>
/// Subgroup analysis of a binary responder endpoint: the counting of the "responders" kind
/// (<see cref="ResponderAnalysis"/>) repeated overall and within each level of each subgroup
/// variable, with per arm responders n/N (%), per active arm against the control the effect
/// (<see cref="SubgroupMeasure"/>) with its interval, per subgroup variable the treatment-by-subgroup
/// interaction test (<see cref="SubgroupInteraction"/>), and a forest plot of the effects.
/// </summary>
public sealed class SubgroupAnalysis : ITableAnalysis
{
    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var endpoint = table.Endpoint!;
        var reads = EndpointRecords.Reads(table, PopulationSelection.Reads(study, table, new VariableReads()))
            .AddCondition(endpoint.Dataset, endpoint.Response);
        foreach (var variable in table.Settings<SubgroupSettings>().Variables)
        {
            reads.Add(VariableReads.SubjectLevel, variable.Variable);
            if (variable.Levels is null)
            {
                // Unlisted levels follow the variable's numeric companion (e.g. AGEGR1N) where ADSL has one.
                reads.AddOptional(VariableReads.SubjectLevel, variable.Variable + SubgroupVariable.OrderSuffix);
            }
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var endpoint = table.Endpoint!;
        var settings = table.Settings<SubgroupSettings>();
        var statistics = table.Statistics;
        var selection = PopulationSelection.Select(study, table, data);
        var records = EndpointRecords.Select(table, data);
        var response = records.CompileResponse(table);
        var missingAreNonResponders = endpoint.Missing == MissingResponse.NonResponder;
        var measure = SubgroupMeasure.From(settings.Measure, statistics.DifferenceInterval, statistics.Level, statistics.PercentDecimals, settings.RatioDecimals);
        var level = MethodCatalog.LevelText(statistics.Level);
        var control = selection.Control;
        var active = selection.Arms.Where(a => !a.IsControl).ToList();
        var variables = settings.Variables
            .Select((v, i) => SubgroupVariable.Resolve(v, i, data.SubjectLevel, selection.ArmOfSubject.Keys, table.Source))
            .ToList();
        if (variables.GroupBy(v => v.Name, StringComparer.OrdinalIgnoreCase).FirstOrDefault(g => g.Count() > 1) is { } twice)
        {
            throw new SpecException(table.Source.Problem("/subgroups/variables", $"subgroup variable {twice.Key} is listed more than once"));
        }

        var armColumns = selection.Arms.Select(a => new ResultColumn(a.Key, a.Label, selection.Count(a))).ToList();
        var effectColumns = active.Select(a => new ResultColumn(EffectKey(a, control), $"{a.Label}\nvs {control.Label}\n{measure.Label}\n({{level}} CI)", null)
        {
            Level = statistics.Level,
            NoteRefs = [EffectNote],
        }).ToList();
        var columns = armColumns.Concat(effectColumns).ToList();
        var warnings = new List<ResultNote>();
        var plot = new List<ForestPlotRow>();

        ResultRow CountRow(string key, string label, int indent, IEnumerable<KeyValuePair<string, TreatmentArm>> subjects, string where)
        {
            var subset = subjects.ToList();
            var counts = selection.Arms.ToDictionary(a => a, a => ResponderAnalysis.Count(subset, a, records, response, missingAreNonResponders));
            var cells = selection.Arms.Select(a => SubgroupCells.Responders(a.Key, counts[a], statistics.PercentDecimals)).ToList();
            var effects = new List<IntervalResult>();
            foreach (var arm in active)
            {
                var effect = Effect(measure, counts[arm], counts[control], settings.MinimumPerArm, arm, control);
                effects.Add(effect);
                cells.Add(SubgroupCells.Effect(EffectKey(arm, control), effect, measure));
                var what = new NoteSubject(What: where, Arm: arm.Label, Control: control.Label);
                warnings.AddRange(effect.Notes.Select(n => ResultNote.Warning(NoteKind.MethodRemark, what, ("text", n))));
                if (!effect.IsEstimable)
                {
                    warnings.Add(ResultNote.Warning(NoteKind.EffectNotEstimated, what, ("measure", measure.Code), ("reason", effect.NotEstimableReason!)));
                }
            }
            plot.Add(new ForestPlotRow(label, indent, effects));
            return new ResultRow(key, label, indent, cells);
        }

        var rows = new List<ResultRow> { CountRow("overall", "Overall", 0, selection.ArmOfSubject, "Overall") };
        foreach (var variable in variables)
        {
            var variableKey = ResultKey.Part(variable.Name);
            warnings.AddRange(variable.Warnings());
            rows.Add(Blank(columns));
            rows.Add(new ResultRow(variableKey, variable.Label, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Section));
            plot.Add(new ForestPlotRow(variable.Label, 0, null));
            var keys = variable.Levels.Select(l => ResultKey.Below(variableKey, l.Value)).ToList();
            for (var i = 0; i < variable.Levels.Count; i++)
            {
                var index = i;
                var subjects = selection.ArmOfSubject.Where(s => variable.LevelOfSubject.TryGetValue(s.Key, out var l) && l == index);
                rows.Add(CountRow(keys[i], variable.Levels[i].Label, 1, subjects, $"{variable.Label} {variable.Levels[i].Label}"));
            }
            rows.Add(InteractionRow(variable, variableKey, settings.Interaction, selection, records, response, missingAreNonResponders,
                columns, active, control, warnings));
        }

        var notes = new List<ResultNote>
        {
            ResultNote.Footnote("counts", NoteKind.SubgroupCounts, ("nonResponders", missingAreNonResponders), ("population", selection.Label),
                ("endpoint", endpoint.Label ?? endpoint.Response!)),
            measure.Note(EffectNote, control.Label, settings.MinimumPerArm),
            ResultNote.Footnote(InteractionNote, NoteKind.SubgroupInteraction, ("method", settings.Interaction switch
            {
                InteractionTest.BreslowDay => "breslow-day",
                InteractionTest.BreslowDayTarone => "breslow-day-tarone",
                _ => "likelihood-ratio",
            }), ("control", control.Label)),
            ResultNote.Footnote("levels", NoteKind.SubgroupLevels, ("labels", variables.Select(v => v.Label).ToList()),
                ("variables", variables.Select(v => v.Name).ToList()), ("orders", variables.Select(v => v.Order).ToList())),
        };
        // The same remark can arise for several rows (e.g. a level and the overall row): each is said once.
        TableResult Result() => new(table.Id, table.Title, selection.Label, columns, rows, [], selection.Warnings.Distinct().ToList(), table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", endpoint.Dataset]), statistics.PercentDecimals, statistics.PValueFloor)
        {
            Notes = [.. notes, .. warnings.DistinctBy(NoteIdentity.Of)],
        };
        if (!settings.ForestPlot)
        {
            return Result();
        }
        var forest = new ForestPlot(table.Id, plot, active.Select(a => a.Label).ToList(), control.Label, measure, level);
        return Result() with { Figure = ForestPlotFigure.Describe(forest) };
    }

    private static string EffectKey(TreatmentArm arm, TreatmentArm control) => $"{arm.Key}-vs-{control.Key}";

    private const string EffectNote = "effect";

    private const string InteractionNote = "interaction";

    /// <summary>The effect, unless an arm compared is below the spec's minimum size in the subjects counted.</summary>
    private static IntervalResult Effect(SubgroupMeasure measure, ResponderCounts active, ResponderCounts control, int minimum,
        TreatmentArm activeArm, TreatmentArm controlArm)
    {
        var small = new[] { (activeArm, active), (controlArm, control) }.Where(p => p.Item2.Denominator < minimum).ToList();
        if (small.Count > 0)
        {
            return IntervalResult.NotEstimable(string.Join(" and ", small.Select(p =>
                string.Create(CultureInfo.InvariantCulture, $"{p.Item1.Label} has {p.Item2.Denominator} subject{(p.Item2.Denominator == 1 ? "" : "s")}"))) +
                $", fewer than the minimum of {minimum}");
        }
        return measure.Compute(active, control);
    }

    private static ResultRow InteractionRow(SubgroupVariable variable, string variableKey, InteractionTest method, PopulationSelection selection,
        EndpointRecords records, Expressions.Condition response, bool missingAreNonResponders, IReadOnlyList<ResultColumn> columns,
        IReadOnlyList<TreatmentArm> active, TreatmentArm control, List<ResultNote> warnings)
    {
        var cells = columns.Select(c => CellFactory.Empty(c.Key)).ToList();
        foreach (var arm in active)
        {
            var levelCells = variable.Levels.Select((l, i) =>
            {
                var subjects = selection.ArmOfSubject.Where(s => variable.LevelOfSubject.TryGetValue(s.Key, out var k) && k == i).ToList();
                return (l, ResponderAnalysis.Count(subjects, arm, records, response, missingAreNonResponders),
                    ResponderAnalysis.Count(subjects, control, records, response, missingAreNonResponders));
            }).ToList();
            var what = new NoteSubject(What: $"{variable.Label} interaction", Arm: arm.Label, Control: control.Label);
            var test = SubgroupInteraction.Compute(method, levelCells, what, (arm.Label, control.Label), warnings);
            if (!test.IsEstimable)
            {
                warnings.Add(ResultNote.Warning(NoteKind.NoPValue, what, ("reason", test.NotEstimableReason!)));
            }
            var key = EffectKey(arm, control);
            cells[columns.ToList().FindIndex(c => c.Key == key)] = CellFactory.PValueOf(key, test);
        }
        return new ResultRow(variableKey + "/interaction", "Interaction p", 1, cells) { NoteRefs = [InteractionNote] };
    }

    private static ResultRow Blank(IReadOnlyList<ResultColumn> columns) =>
        new("blank", string.Empty, 0, columns.Select(c => CellFactory.Empty(c.Key)).ToList(), ResultRowKind.Blank);
}
