namespace OutputForge.Workflow.Compare;

public enum QcOutcome { Matched, Mismatched, OnlyInQc }

/// <summary>What became of one QC line: the production number it was compared with (if found) and why it failed (if it did).</summary>
public sealed record QcCheck(QcLine Line, RunRecord? Production, QcOutcome Outcome, string? Reason);

/// <summary>
/// The comparison of a QC file with a production run: every QC line's outcome, and the
/// production numbers no QC line named. <see cref="Passed"/> only when every QC line matched.
/// </summary>
public sealed record CompareResult(
    string ProductionFile,
    string QcFile,
    CompareTolerance Tolerance,
    IReadOnlyList<QcCheck> Checks,
    IReadOnlyList<RunRecord> OnlyInProduction)
{
    public int Matched => Checks.Count(c => c.Outcome == QcOutcome.Matched);
    public int Mismatched => Checks.Count(c => c.Outcome == QcOutcome.Mismatched);
    public int OnlyInQc => Checks.Count(c => c.Outcome == QcOutcome.OnlyInQc);
    public bool Passed => Checks.All(c => c.Outcome == QcOutcome.Matched);

    /// <summary>"matched 63, mismatched 1, only in production 120, only in QC 0".</summary>
    public string Summary =>
        $"matched {Matched}, mismatched {Mismatched}, only in production {OnlyInProduction.Count}, only in QC {OnlyInQc}";
}
