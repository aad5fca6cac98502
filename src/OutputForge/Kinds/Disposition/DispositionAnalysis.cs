using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;

namespace OutputForge.Kinds.Disposition;

/// <summary>
/// Subject disposition: blocks of n (%) per arm (completion status, reasons for discontinuation),
/// each an ADSL variable counted over the population or over the subjects a condition selects;
/// percentages are of the column's N. A block may carry an overall test across the arms (Pearson's
/// chi-square or Fisher's exact test of its levels x arms table), shown on its heading row.
/// Row keys: "{block key}" for the heading, "{block key}/{value}" for the levels.
/// </summary>
public sealed class DispositionAnalysis : ITableAnalysis
{
    public const string PValueColumn = "p-value";

    private const string AcrossArmsNote = "across-arms-test";

    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var reads = PopulationSelection.Reads(study, table, new VariableReads());
        foreach (var block in table.Settings<DispositionSettings>().Blocks)
        {
            reads.Add(VariableReads.SubjectLevel, block.Variable)
                .AddCondition(VariableReads.SubjectLevel, block.Where)
                .Add(VariableReads.SubjectLevel, block.OrderBy);
        }
        return reads;
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var settings = table.Settings<DispositionSettings>();
        var selection = PopulationSelection.Select(study, table, data);
        var adsl = data.SubjectLevel;
        var subjects = SubjectRows.Of(adsl, selection);
        var columns = SummaryColumns.For(selection, study, settings.Total);
        var resultColumns = SummaryColumns.ToResultColumns(columns);
        var tested = settings.Blocks.Any(b => b.Test != SummaryTest.None);
        if (tested)
        {
            resultColumns.Add(new ResultColumn(PValueColumn, "p-value", null) { NoteRefs = [AcrossArmsNote] });
        }
        var columnKeys = resultColumns.Select(c => c.Key).ToList();
        var rows = new List<ResultRow>();
        var warnings = new List<ResultNote>();
        var testsUsed = new List<(string Block, string Method)>();
        for (var i = 0; i < settings.Blocks.Count; i++)
        {
            var spec = settings.Blocks[i];
            var key = ResultKey.Part(spec.Key ?? spec.Variable);
            if (rows.Any(r => r.Key == key))
            {
                throw new SpecException(table.Source.Problem($"/disposition/blocks/{i}", $"block key '{key}' is used twice; give the block its own \"key\""));
            }
            var request = new CategoricalRequest(spec.Variable, key, spec.Where, spec.Levels, spec.OrderBy, spec.Order, spec.Missing, $"/disposition/blocks/{i}");
            var block = CategoricalSummary.Summarize(request, adsl, subjects, selection.Arms, columns, settings.Percent, table.Source, 1);
            warnings.AddRange(block.Warnings.Select(w => ResultNote.Warning(NoteKind.Text, new NoteSubject(What: spec.Label), ("text", w))));
            var headingCells = new List<ResultCell>();
            if (spec.Test != SummaryTest.None)
            {
                var (test, testWarnings) = AssociationTest.Run(spec.Test, block.LevelsByArm, spec.Label, ExactTestFallback.For(study));
                warnings.AddRange(testWarnings);
                headingCells.Add(CellFactory.PValueOf(PValueColumn, test));
                testsUsed.Add((spec.Label, test.Method));
            }
            if (i > 0)
            {
                rows.Add(SummaryRows.Blank($"blank-{i}", columnKeys));
            }
            rows.Add(SummaryRows.Heading(key, spec.Label, columnKeys, headingCells));
            rows.AddRange(block.Rows);
        }
        var notes = new List<ResultNote>();
        if (tested)
        {
            notes.Add(ResultNote.Footnote(AcrossArmsNote, NoteKind.AcrossArmsTest,
                ("methods", testsUsed.Select(t => t.Method).ToList()), ("subjects", testsUsed.Select(t => t.Block).ToList())));
        }
        notes.Add(ResultNote.Footnote("denominators", NoteKind.Denominators, ("population", selection.Label)));
        warnings.AddRange(NotEstimableNotes.Of(rows));
        return new TableResult(table.Id, table.Title, selection.Label, resultColumns, rows, [], selection.Warnings, table.Footnotes,
            new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl"]), settings.Percent.Decimals, settings.PValueFloor,
            SummaryColumns.StyleOf(settings.Percent)) { Notes = [.. notes, .. warnings] };
    }
}
