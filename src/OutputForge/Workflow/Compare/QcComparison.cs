namespace OutputForge.Workflow.Compare;

/// <summary>
/// Compares a QC statistician's numbers with a production run's results.json, line by line
/// (docs/qc-workflow.md): counts exactly, other statistics within the tolerance.
/// </summary>
public static class QcComparison
{
    public static CompareResult Run(string production, string qcFile, CompareTolerance tolerance)
    {
        var results = RunResults.Read(production);
        var lines = QcCsvReader.Read(qcFile);
        var lookup = new RecordLookup(results.Records);
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
        var onlyInProduction = results.Records.Where(r => !named.Contains(r)).ToList();
        return new CompareResult(results.File, qcFile, tolerance, checks, onlyInProduction);
    }
}
