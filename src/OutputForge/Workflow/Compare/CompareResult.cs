namespace OutputForge.Workflow.Compare;

public enum QcOutcome { Matched, Mismatched, OnlyInQc }

/// <summary>What became of one QC line: the production number it was compared with (if found) and why it failed (if it did).</summary>
public sealed record QcCheck(QcLine Line, RunRecord? Production, QcOutcome Outcome, string? Reason);

/// <summary>
/// The comparison of a QC file with a production run: every QC line's outcome, and the
/// production numbers no QC line named, in the tables the QC file names (tables it never names
/// are only counted). <see cref="Passed"/> only when every QC line matched.
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

    /// <summary>Production tables that at least one QC line names.</summary>
    public int TablesNamed { get; init; }

    /// <summary>Production tables no QC line names: their numbers are not counted as only in production.</summary>
    public int TablesNotNamed { get; init; }

    /// <summary>Which numbers "only in production" counts: "in the 2 tables the QC file names; 16 tables it does not name are not counted".</summary>
    public string OnlyInProductionScope =>
        $"in the {TablesNamed} table{(TablesNamed == 1 ? "" : "s")} the QC file names" +
        (TablesNotNamed == 0 ? string.Empty : $"; {TablesNotNamed} table{(TablesNotNamed == 1 ? "" : "s")} it does not name {(TablesNotNamed == 1 ? "is" : "are")} not counted");

    /// <summary>"matched 63, mismatched 1, only in production 120 (in the 2 tables the QC file names; ...), only in QC 0".</summary>
    public string Summary =>
        $"matched {Matched}, mismatched {Mismatched}, only in production {OnlyInProduction.Count} ({OnlyInProductionScope}), only in QC {OnlyInQc}";
}
