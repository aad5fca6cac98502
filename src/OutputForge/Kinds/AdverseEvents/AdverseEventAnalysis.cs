using OutputForge.Analysis;
using OutputForge.Analysis.Summaries;
using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Stats;

namespace OutputForge.Kinds.AdverseEvents;

/// <summary>
/// Adverse events by system organ class and preferred term: subjects with at least one event,
/// n (%) of the population per arm, each subject counted once per row whatever its number of
/// events; optionally the number of events [E], a by-severity breakdown (each subject once per row,
/// at its maximum severity), a frequency threshold on terms, and Fisher's exact test of each active
/// arm against the control. Row keys (<see cref="ResultKey"/>): "any", "soc-{class}", "soc-{class}/pt-{term}", each
/// followed by "/severity-{value}" for the severity rows.
/// </summary>
public sealed class AdverseEventAnalysis : ITableAnalysis
{
    public const string AnyKey = "any";

    public VariableReads Reads(StudySpec study, TableSpec table)
    {
        var settings = table.Settings<AdverseEventsSettings>();
        return PopulationSelection.Reads(study, table, new VariableReads())
            .Add(settings.Dataset, [AdamConformance.SubjectVariable, settings.SocVariable, settings.TermVariable])
            .AddCondition(settings.Dataset, settings.Where)
            .Add(settings.Dataset, settings.Severity?.Variable);
    }

    public TableResult Analyze(StudySpec study, TableSpec table, StudyData data)
    {
        var settings = table.Settings<AdverseEventsSettings>();
        var selection = PopulationSelection.Select(study, table, data);
        var warnings = new List<string>(selection.Warnings);
        var records = AdverseEventRecords.Read(study, table, data, selection, warnings);
        var columns = SummaryColumns.For(selection, study, settings.Total);
        var control = selection.Control;
        var active = settings.Test == SummaryTest.Fisher ? selection.Arms.Where(a => !a.IsControl).ToList() : [];
        var resultColumns = SummaryColumns.ToResultColumns(columns);
        resultColumns.AddRange(active.Select(a => new ResultColumn(PValueKey(a), $"{a.Label}\nvs {control.Label}\np-value", null) { NoteRefs = [PairwiseTestNote] }));
        var context = new RowContext(settings, columns, selection, active, control,
            settings.Severity?.Levels ?? [], resultColumns.Select(c => c.Key).ToList());

        var sortColumn = SortColumn(settings, selection, table.Source);
        var classes = records.GroupBy(r => r.Soc, StringComparer.Ordinal)
            .Select(g => (Soc: g.Key, Records: g.ToList(), Terms: g.GroupBy(r => r.Term, StringComparer.Ordinal)
                .Select(t => (Term: t.Key, Records: t.ToList()))
                .Where(t => Passes(t.Records, settings.Threshold, selection, columns, table.Source))
                .ToList()))
            .Where(c => c.Terms.Count > 0)
            .ToList();

        var rows = new List<ResultRow>();
        rows.AddRange(context.Rows(AnyKey, settings.AnyLabel, 0, records));
        if (settings.SocRows)
        {
            foreach (var socClass in Sorted(classes, c => c.Soc, c => c.Records, settings.Sort.By, sortColumn))
            {
                rows.Add(SummaryRows.Blank(ResultKey.Of("blank", socClass.Soc), context.ColumnKeys));
                var socKey = SocKey(socClass.Soc);
                rows.AddRange(context.Rows(socKey, socClass.Soc, 0, socClass.Records));
                foreach (var term in Sorted(socClass.Terms, t => t.Term, t => t.Records, settings.Sort.By, sortColumn))
                {
                    rows.AddRange(context.Rows(TermKey(socKey, term.Term), term.Term, 1, term.Records));
                }
            }
        }
        else
        {
            var terms = classes.SelectMany(c => c.Terms.Select(t => (Key: TermKey(SocKey(c.Soc), t.Term), t.Term, t.Records))).ToList();
            rows.Add(SummaryRows.Blank("blank/terms", context.ColumnKeys));
            foreach (var term in Sorted(terms, t => t.Term, t => t.Records, settings.Sort.By, sortColumn))
            {
                rows.AddRange(context.Rows(term.Key, term.Term, 1, term.Records));
            }
        }

        var notes = Notes(settings, selection, control, active.Count > 0);
        if (context.NeitherArmHasTheEvent)
        {
            notes.Insert(1, ResultNote.Footnote("single-table", NoteKind.SingleTableFits));
        }
        notes.AddRange(context.Warnings.DistinctBy(n => (n.Subject, n.Text("text"))));
        notes.AddRange(NotEstimableNotes.Of(rows));
        return new TableResult(table.Id, table.Title, selection.Label, resultColumns, rows, [],
            warnings, table.Footnotes, new TableProvenance(SpecPaths.RelativeToStudy(study, table), ["adsl", settings.Dataset]),
            settings.Percent.Decimals, settings.PValueFloor, SummaryColumns.StyleOf(settings.Percent)) { Notes = notes };
    }

    public static string PValueKey(TreatmentArm arm) => $"p-value-{arm.Key}";

    private static string SocKey(string soc) => ResultKey.Part("soc " + soc);

    private static string TermKey(string socKey, string term) => ResultKey.Below(socKey, "pt " + term);

    private const string PairwiseTestNote = "pairwise-test";

    /// <summary>The arms whose count orders rows by frequency: one arm, or all of them ("total").</summary>
    private static IReadOnlySet<TreatmentArm> SortColumn(AdverseEventsSettings settings, PopulationSelection selection, SpecSource source)
    {
        var column = settings.Sort.Column;
        if (column.Kind == ArmChoiceKind.Total)
        {
            return selection.Arms.ToHashSet();
        }
        var arm = selection.Arms.FirstOrDefault(a => a.Value == column.Text) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, "/adverseEvents/sort/column",
            $"'{column.Text}' is neither 'total' nor an arm of {selection.TreatmentVariable}{NearestName.Hint(column.Text, selection.Arms.Select(a => a.Value).ToList())}"));
        return new HashSet<TreatmentArm> { arm };
    }

    private static IEnumerable<T> Sorted<T>(IEnumerable<T> items, Func<T, string> name, Func<T, List<AdverseEventRecord>> records,
        LevelSorting by, IReadOnlySet<TreatmentArm> arms)
    {
        var byName = StringComparer.OrdinalIgnoreCase;
        return by == LevelSorting.Frequency
            ? items.OrderByDescending(i => records(i).Where(r => arms.Contains(r.Arm)).Select(r => r.Subject).Distinct(StringComparer.Ordinal).Count())
                .ThenBy(name, byName).ThenBy(name, StringComparer.Ordinal)
            : items.OrderBy(name, byName).ThenBy(name, StringComparer.Ordinal);
    }

    /// <summary>
    /// Whether a term meets the threshold: at least the given percentage of subjects in any arm, in
    /// the total, or in one arm. Compared exactly, as 100 n &gt;= threshold x N in decimals.
    /// </summary>
    private static bool Passes(List<AdverseEventRecord> records, AdverseEventThresholdSpec? threshold, PopulationSelection selection,
        IReadOnlyList<SummaryColumn> columns, SpecSource source)
    {
        if (threshold is null)
        {
            return true;
        }
        bool Meets(IReadOnlySet<TreatmentArm> arms)
        {
            var n = records.Where(r => arms.Contains(r.Arm)).Select(r => r.Subject).Distinct(StringComparer.Ordinal).Count();
            var denominator = arms.Sum(selection.Count);
            return denominator > 0 && 100m * n >= (decimal)threshold.Percent * denominator;
        }
        return threshold.In.Kind switch
        {
            ArmChoiceKind.AnyArm => selection.Arms.Any(a => Meets(new HashSet<TreatmentArm> { a })),
            ArmChoiceKind.Total => Meets(selection.Arms.ToHashSet()),
            _ => Meets(new HashSet<TreatmentArm>
            {
                selection.Arms.FirstOrDefault(a => a.Value == threshold.In.Text) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownDataValue, "/adverseEvents/threshold/in",
                    $"'{threshold.In.Text}' is neither 'any-arm', 'total' nor an arm of {selection.TreatmentVariable}{NearestName.Hint(threshold.In.Text, selection.Arms.Select(a => a.Value).ToList())}")),
            }),
        };
    }

    private static List<ResultNote> Notes(AdverseEventsSettings settings, PopulationSelection selection, TreatmentArm control, bool tested)
    {
        var notes = new List<ResultNote>();
        if (tested)
        {
            notes.Add(ResultNote.Footnote(PairwiseTestNote, NoteKind.PairwiseEventTest, ("method", FisherExactTest.MethodName), ("control", control.Label)));
        }
        notes.Add(ResultNote.Footnote("denominators", NoteKind.EventDenominators, ("population", selection.Label)));
        if (settings.Events)
        {
            notes.Add(ResultNote.Footnote("event-counts", NoteKind.EventCounts));
        }
        if (settings.Severity is { } severity)
        {
            notes.Add(ResultNote.Footnote("severity", NoteKind.SeverityRows,
                ("levels", severity.Levels.Select(l => l.Label ?? l.Value).ToList()), ("withEvents", settings.Events)));
        }
        if (settings.Where is not null)
        {
            notes.Add(ResultNote.Footnote("events-counted", NoteKind.EventsCounted, ("condition", settings.Where)));
        }
        if (settings.Threshold is { } threshold)
        {
            notes.Add(ResultNote.Footnote("threshold", NoteKind.TermThreshold, ("percent", threshold.Percent),
                ("place", PlaceOf(threshold.In)), ("arm", threshold.In.Text)));
        }
        notes.Add(settings.Sort.By == LevelSorting.Frequency
            ? ResultNote.Footnote("order", NoteKind.RowOrder, ("place", PlaceOf(settings.Sort.Column)), ("arm", settings.Sort.Column.Text))
            : ResultNote.Footnote("order", NoteKind.RowOrder));
        return notes;
    }

    /// <summary>Where a count is taken, as a note says it: "any-arm", "total" or "arm" (the arm then in the note's "arm").</summary>
    private static string PlaceOf(ArmChoice choice) => choice.Kind switch
    {
        ArmChoiceKind.AnyArm => "any-arm",
        ArmChoiceKind.Total => "total",
        _ => "arm",
    };

    /// <summary>Builds a row (and its severity rows) from the records it counts.</summary>
    private sealed class RowContext(AdverseEventsSettings settings, IReadOnlyList<SummaryColumn> columns, PopulationSelection selection,
        IReadOnlyList<TreatmentArm> active, TreatmentArm control, IReadOnlyList<LevelSpec> severities, List<string> columnKeys)
    {
        public List<string> ColumnKeys { get; } = columnKeys;
        public List<ResultNote> Warnings { get; } = [];
        public bool NeitherArmHasTheEvent { get; private set; }

        public IEnumerable<ResultRow> Rows(string key, string label, int indent, IReadOnlyCollection<AdverseEventRecord> records)
        {
            var counts = AdverseEventCounts.OfColumns(records, columns, severities.Count);
            var cells = columns.Select(c => CountCells.CountPercent(c.Key, counts[c.Key].Subjects, c.N, settings.Percent,
                settings.Events ? counts[c.Key].Events : null)).ToList();
            foreach (var arm in active)
            {
                cells.Add(PValue(arm, label, counts));
            }
            yield return new ResultRow(key, label, indent, cells);
            for (var level = 0; level < severities.Count; level++)
            {
                var severity = severities[level];
                // A class's severity rows sit as deep as its terms' own, so that they do not read as terms.
                yield return new ResultRow(ResultKey.Below(key, "severity " + severity.Value), severity.Label ?? severity.Value, key == AnyKey ? 1 : 2,
                    // No [E] here: a subject counted at its maximum severity may have events of other severities,
                    // so an event count beside it would not describe the subjects counted.
                    columns.Select(c => CountCells.CountPercent(c.Key, counts[c.Key].SubjectsAtMaximumSeverity[level], c.N, settings.Percent)).ToList());
            }
        }

        private ResultCell PValue(TreatmentArm arm, string label, Dictionary<string, AdverseEventCounts> counts)
        {
            var withEvent = counts[arm.Key].Subjects;
            var controlWithEvent = counts[control.Key].Subjects;
            var test = FisherExactTest.TwoByTwo(withEvent, selection.Count(arm) - withEvent, controlWithEvent, selection.Count(control) - controlWithEvent);
            if (withEvent + controlWithEvent == 0)
            {
                // Neither arm has the event (it occurs in another arm only): one table fits the margins and p is 1,
                // which the method note states once rather than a warning per row.
                NeitherArmHasTheEvent = true;
            }
            else
            {
                Warnings.AddRange(test.Notes.Select(n => ResultNote.Warning(NoteKind.MethodRemark,
                    new NoteSubject(What: label, Arm: arm.Label, Control: control.Label), ("text", n))));
            }
            return CellFactory.PValueOf(PValueKey(arm), test);
        }
    }
}
