using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;
using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;

namespace OutputForge.Kinds.Demographics;

/// <summary>
/// Demographics and baseline characteristics: one block per ADSL variable, under a heading row
/// keyed by the variable name. Continuous variables get the statistic rows the spec lists;
/// categorical ones n (%) per level, percentages of the column's N. An optional p-value per
/// variable (one-way ANOVA F test, Pearson's chi-square or Fisher's exact test across the arms,
/// Total not included) stands on the heading row, in the "p-value" column.
/// </summary>
public sealed class DemographicsAnalysis : ITableAnalysis
{
    public const string PValueColumn = "p-value";

    private const string AcrossArmsNote = "across-arms-test";

    /// <summary>The one-way ANOVA F test across the arms, as a test result (its degrees of freedom are the numerator's).</summary>
    private static TestResult AnovaTest(IReadOnlyList<IReadOnlyList<double>> arms)
    {
        var anova = OneWayAnova.Compute(arms);
        return anova.IsEstimable
            ? new TestResult(AnovaResult.MethodName, anova.FStatistic, anova.BetweenDegreesOfFreedom, anova.PValue) { Notes = anova.Notes }
            : TestResult.NotEstimable(AnovaResult.MethodName, anova.NotEstimableReason!) with { Notes = anova.Notes };
    }

    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var reads = PopulationSelection.Reads(study, table, new VariableReads());
        foreach (var variable in table.Settings<DemographicsSettings>().Variables)
        {
            reads.Add(VariableReads.SubjectLevel, variable.Variable).Add(VariableReads.SubjectLevel, variable.OrderBy);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var settings = table.Settings<DemographicsSettings>();
        var selection = PopulationSelection.Select(study, table, data);
        var adsl = data.SubjectLevel;
        var subjects = SubjectRows.Of(adsl, selection);
        var columns = SummaryColumns.For(selection, study, settings.Total);
        var resultColumns = SummaryColumns.ToResultColumns(columns);
        var tested = settings.Variables.Any(v => v.Test != SummaryTest.None);
        if (tested)
        {
            resultColumns.Add(new ResultColumn(PValueColumn, "p-value", null) { NoteRefs = [AcrossArmsNote] });
        }
        var columnKeys = resultColumns.Select(c => c.Key).ToList();
        var rows = new List<ResultRow>();
        var warnings = new List<ResultNote>();
        var testsUsed = new List<(string Variable, string Method)>();
        for (var i = 0; i < settings.Variables.Count; i++)
        {
            var spec = settings.Variables[i];
            var pointer = $"/demographics/variables/{i}";
            if (rows.Any(r => r.Key == ResultKey.Part(spec.Variable)))
            {
                throw new SpecException(table.Source.Problem(pointer + "/variable", $"{spec.Variable} is summarized twice in this table"));
            }
            var column = adsl.Find(spec.Variable) ?? throw new SpecException(table.Source.Problem(SpecProblemCode.UnknownVariable, pointer + "/variable",
                $"ADSL has no variable {spec.Variable}{NearestName.Hint(spec.Variable, adsl.VariableNames)}"));
            // The spec's label first; else the variable's label as the file gives it (XPT, Dataset-JSON); else its name.
            var label = spec.Label ?? column.Label ?? spec.Variable;
            List<ResultRow> blockRows;
            TestResult? test = null;
            if (spec.Type == DemographicVariableType.Continuous)
            {
                if (column.Kind != Expressions.VariableKind.Number)
                {
                    throw new SpecException(table.Source.Problem(pointer + "/type",
                        $"{spec.Variable} is not numeric in {Path.GetFileName(adsl.File)}{(column.TextEvidence is { } evidence ? $" ({evidence} is not a number)" : "")}, so it cannot be summarized as continuous (use \"categorical\")"));
                }
                var (continuousRows, armValues, continuousWarnings) = ContinuousSummary.Summarize(spec, settings, column, subjects,
                    selection.Arms, columns, table.Source, pointer);
                blockRows = continuousRows;
                warnings.AddRange(continuousWarnings.Select(w => ResultNote.Warning(NoteKind.Text, new NoteSubject(What: label), ("text", w))));
                if (spec.Test == SummaryTest.Anova)
                {
                    test = AnovaTest(armValues);
                    warnings.AddRange(test.Notes.Select(n => ResultNote.Warning(NoteKind.MethodRemark, new NoteSubject(What: label), ("text", n))));
                    if (!test.IsEstimable)
                    {
                        warnings.Add(ResultNote.Warning(NoteKind.TestNotEstimable, new NoteSubject(What: label),
                            ("method", test.Method), ("reason", test.NotEstimableReason!)));
                    }
                }
            }
            else
            {
                var request = new CategoricalRequest(spec.Variable, spec.Variable, null, spec.Levels, spec.OrderBy, spec.Order, spec.Missing, pointer);
                var block = CategoricalSummary.Summarize(request, adsl, subjects, selection.Arms, columns, settings.Percent, table.Source, 1);
                blockRows = block.Rows.ToList();
                warnings.AddRange(block.Warnings.Select(w => ResultNote.Warning(NoteKind.Text, new NoteSubject(What: label), ("text", w))));
                if (spec.Test != SummaryTest.None)
                {
                    (test, var testWarnings) = AssociationTest.Run(spec.Test, block.LevelsByArm, label, ExactTestFallback.For(study));
                    warnings.AddRange(testWarnings);
                }
            }
            if (i > 0)
            {
                rows.Add(SummaryRows.Blank($"blank-{i}", columnKeys));
            }
            var headingCells = new List<ResultCell>();
            if (test is not null)
            {
                headingCells.Add(CellFactory.PValueOf(PValueColumn, test));
                testsUsed.Add((label, test.Method));
            }
            rows.Add(SummaryRows.Heading(ResultKey.Part(spec.Variable), label, columnKeys, headingCells));
            rows.AddRange(blockRows);
        }
        var notes = new List<ResultNote>();
        if (tested)
        {
            notes.Add(ResultNote.Footnote(AcrossArmsNote, NoteKind.AcrossArmsTest,
                ("methods", testsUsed.Select(t => t.Method).ToList()), ("subjects", testsUsed.Select(t => t.Variable).ToList())));
        }
        notes.Add(ResultNote.Footnote("denominators", NoteKind.Denominators, ("population", selection.Label), ("withValue", true)));
        warnings.AddRange(NotEstimableNotes.Of(rows));
        return new TableResult(table.Id, table.Title, selection.Label, resultColumns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl"]), settings.Percent.Decimals, settings.PValueFloor,
            SummaryColumns.StyleOf(settings.Percent)) { Notes = [.. notes, .. warnings] };
    }
}
