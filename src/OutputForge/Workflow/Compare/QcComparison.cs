namespace OutputForge.Workflow.Compare;

/// <summary>
/// Compares a QC statistician's numbers with a production run's results.json, line by line
/// (docs/qc-workflow.md): counts exactly, other statistics within the tolerance.
/// </summary>
internal static class QcComparison
{
    public static CompareResult Run(string production, string qcFile, CompareTolerance tolerance)
    {
        var results = RunResults.Read(production);
        var lines = QcCsvReader.Read(qcFile);
        var lookup = new RecordLookup(results.Records, qcFile);
        var checks = new List<QcCheck>(lines.Count);
        var named = new HashSet<RunRecord>();
        foreach (var line in lines)
        {
            var record = lookup.Find(line, out var problem);
            if (record is null)
            {
                checks.Add(new QcCheck(line, null, QcOutcome.OnlyInQc, problem));
                continue;
            }
            named.Add(record);
            var disagreement = ValueAgreement.Disagreement(record, line.Value, tolerance);
            checks.Add(new QcCheck(line, record, disagreement is null ? QcOutcome.Matched : QcOutcome.Mismatched, disagreement));
        }
        // A QC file usually covers some tables: the numbers of tables it never names are not "only in production" but
        // out of its scope, and are only counted as tables.
        var mentioned = lines.Select(l => l.Table).ToHashSet(StringComparer.OrdinalIgnoreCase);
        var onlyInProduction = results.Records.Where(r => mentioned.Contains(r.Table) && !named.Contains(r)).ToList();
        var tables = results.Records.Select(r => r.Table).Distinct(StringComparer.OrdinalIgnoreCase).ToList();
        return new CompareResult(results.File, qcFile, tolerance, checks, onlyInProduction)
        {
            TablesNamed = tables.Count(mentioned.Contains),
            TablesNotNamed = tables.Count(t => !mentioned.Contains(t)),
        };
    }
}
