using OutputForge.Analysis;
using OutputForge.Data;
using OutputForge.Naming;
using OutputForge.Spec;

namespace OutputForge.Kinds.AdverseEvents;

/// <summary>
/// Reads the events an adverse-event table counts: records of the spec's dataset that meet its
/// condition and belong to a subject of the population (the subject's arm comes from the population,
/// that is from ADSL). Events with no class or term are kept as "Not coded", with a warning.
/// </summary>
public static class AdverseEventRecords
{
    public const string NotCoded = "Not coded";

    public static List<AdverseEventRecord> Read(StudySpec study, TableSpec table, StudyData data, PopulationSelection selection, List<string> warnings)
    {
        var settings = table.Settings<AdverseEventsSettings>();
        if (!study.Data.Datasets.ContainsKey(settings.Dataset))
        {
            throw new SpecException(table.Source.Problem(SpecProblemCode.UnknownReference, "/adverseEvents/dataset",
                $"unknown dataset '{settings.Dataset}'{NearestName.Hint(settings.Dataset, study.Data.Datasets.Keys.ToList())}"));
        }
        var dataset = data[settings.Dataset];
        var subjects = dataset.Get(AdamConformance.SubjectVariable);
        var soc = Find(dataset, settings.SocVariable, table.Source, "/adverseEvents/socVariable");
        var term = Find(dataset, settings.TermVariable, table.Source, "/adverseEvents/termVariable");
        var where = settings.Where is null ? null : new SpecConditionText(settings.Where, table.Source, "/adverseEvents/where").Compile(dataset);
        var severity = settings.Severity is { } s ? Find(dataset, s.Variable, table.Source, "/adverseEvents/severity/variable") : null;
        var ranks = settings.Severity?.Levels.Select((l, i) => (l.Value, i)).ToDictionary(p => p.Value, p => p.i, StringComparer.Ordinal);
        var records = new List<AdverseEventRecord>();
        int notCoded = 0, noSeverity = 0;
        for (var row = 0; row < dataset.RowCount; row++)
        {
            if (where is not null && !where.Matches(row))
            {
                continue;
            }
            if (!selection.ArmOfSubject.TryGetValue(subjects.GetText(row)!, out var arm))
            {
                continue;
            }
            var socText = soc.GetText(row);
            var termText = term.GetText(row);
            if (socText is null || termText is null)
            {
                notCoded++;
            }
            var rank = 0;
            if (severity is not null)
            {
                if (severity.GetText(row) is not { } value)
                {
                    noSeverity++;
                    rank = ranks!.Count - 1;
                }
                else if (!ranks!.TryGetValue(value, out rank))
                {
                    throw new SpecException(table.Source.Problem("/adverseEvents/severity/levels",
                        $"{severity.Name} value '{value}' ({Path.GetFileName(dataset.File)} line {dataset.LineOfRow[row]}) is not among the severity levels{NearestName.Hint(value, ranks.Keys.ToList())}"));
                }
            }
            records.Add(new AdverseEventRecord(subjects.GetText(row)!, arm, socText ?? NotCoded, termText ?? NotCoded, rank));
        }
        if (notCoded > 0)
        {
            warnings.Add($"{notCoded} event{(notCoded == 1 ? " has" : "s have")} no {soc.Name} or {term.Name} and {(notCoded == 1 ? "is" : "are")} counted as \"{NotCoded}\".");
        }
        if (noSeverity > 0)
        {
            warnings.Add($"{noSeverity} event{(noSeverity == 1 ? " has" : "s have")} no {severity!.Name} and {(noSeverity == 1 ? "is" : "are")} counted at the most severe level ({settings.Severity!.Levels[^1].Label ?? settings.Severity.Levels[^1].Value}).");
        }
        return records;
    }

    private static DataColumn Find(Dataset dataset, string name, SpecSource source, string pointer) =>
        dataset.Find(name) ?? throw new SpecException(source.Problem(SpecProblemCode.UnknownVariable, pointer,
            $"{Path.GetFileName(dataset.File)} has no variable {name}{NearestName.Hint(name, dataset.VariableNames)}"));
}
