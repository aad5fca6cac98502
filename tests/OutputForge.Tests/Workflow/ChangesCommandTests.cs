using OutputForge.Tests.Support;
using ClosedXML.Excel;

namespace OutputForge.Tests.Workflow;

/// <summary>`outputforge changes` between the demo run and a rerun with one subject's Week 12 response flipped.</summary>
public sealed class ChangesCommandTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    /// <summary>
    /// The numbers one more responder in one arm moves (the responder kind's rows, docs/results.md):
    /// that arm's responders and non-responders n and percent, its Wilson bounds, its difference
    /// from control with bounds, and its test (p-value and chi-square statistic). Nothing in the
    /// other arms, no N, and the chi-square degrees of freedom stay as they were.
    /// </summary>
    private static readonly string[] AffectedNumbers =
    [
        "responders/n", "responders/percent", "responders-ci/lower", "responders-ci/upper",
        "nonresponders/n", "nonresponders/percent", "difference/estimate", "difference-ci/lower", "difference-ci/upper",
        "p-value/pValue", "p-value/statistic",
    ];

    /// <summary>Table 14.2.1.1 is also stratified, with ratio rows: their numbers change with the flipped response too.</summary>
    private static readonly string[] StratifiedNumbers =
    [
        "stratified-difference/estimate", "stratified-difference-ci/lower", "stratified-difference-ci/upper",
        "cmh-p-value/pValue", "cmh-p-value/statistic", "homogeneity-p-value/pValue", "homogeneity-p-value/statistic",
        "relative-risk/estimate", "relative-risk-ci/lower", "relative-risk-ci/upper",
        "odds-ratio/estimate", "odds-ratio-ci/lower", "odds-ratio-ci/upper",
    ];

    private static string[] AffectedNumbersOf(string table) => table == "14.2.1.1" ? [.. AffectedNumbers, .. StratifiedNumbers] : AffectedNumbers;

    /// <summary>The demo's subgroup analysis of the week-12 responder endpoint (ITT).</summary>
    private const string SubgroupTable = "14.2.5.1";

    [Fact]
    public void AFlippedResponseChangesExactlyTheAffectedNumbers()
    {
        Assert.NotEqual("", demo.FlippedSubject);
        var changes = OutputForge.Workflow.Changes.RunComparison.Compare(demo.Before, demo.After);

        var changedInputs = changes.ChangedInputs.Select(i => $"{i.Kind} {i.Name}").ToList();
        Assert.Equal(["data adeff.csv"], changedInputs);
        // Week 12 tables hold the subject: ITT always, per-protocol only when the subject is in it.
        var expectedTables = demo.FlippedSubjectInPerProtocol ? new[] { "14.2.1.1", "14.2.1.2" } : ["14.2.1.1"];
        Assert.Equal([.. expectedTables, SubgroupTable], changes.ChangedTables.Select(t => t.Id).ToArray());
        // The subgroup table of the same endpoint changes only in the flipped subject's arm and its comparison with placebo.
        var subgroups = changes.ChangedTables.Single(t => t.Id == SubgroupTable);
        Assert.All(subgroups.Numbers, n => Assert.Contains(n.Before.Column, new[] { "qf-217-10-mg", "qf-217-10-mg-vs-placebo" }));
        Assert.Contains(subgroups.Numbers, n => n.Before.Row == "overall" && n.Before.Statistic == "n");
        Assert.Empty(subgroups.RowsAdded);
        foreach (var table in changes.ChangedTables.Where(t => t.Id != SubgroupTable))
        {
            Assert.Equal(AffectedNumbersOf(table.Id).Order(), table.Numbers.Select(n => $"{n.Before.Row}/{n.Before.Statistic}").Order());
            Assert.All(table.Numbers, n => Assert.Equal("qf-217-10-mg", n.Before.Column));
            var responders = table.Numbers.Single(n => n.Before.Row == "responders" && n.Before.Statistic == "n");
            Assert.Equal(responders.Before.Value + 1, responders.After.Value);
            Assert.Empty(table.RowsAdded);
            Assert.Empty(table.ColumnsRemoved);
        }
        Assert.Contains(changes.Tables, t => t.Id == "14.2.1.3" && t.Status == OutputForge.Workflow.Changes.ChangeStatus.Unchanged);
        Assert.Contains(changes.Tables, t => t.Id == "14.2.1.4" && t.Status == OutputForge.Workflow.Changes.ChangeStatus.Unchanged);
    }

    [Fact]
    public void TheCommandPrintsOnePageAndWritesTheWorkbook()
    {
        var report = demo.File("changes/report.xlsx");

        var (code, output, error) = WorkflowDemoFixture.Run(["changes", "--before", demo.Before, "--after", demo.After, "--report", report]);

        Assert.True(code == 0, error);
        var study = DemoStudyTables.Read();
        Assert.Contains($"Inputs changed: 1 of {1 + study.TableFiles.Count + study.DataFiles.Count}", output);
        Assert.Contains("data adeff.csv: changed (SHA-256 ", output);
        var changed = demo.FlippedSubjectInPerProtocol ? new[] { "14.2.1.1", "14.2.1.2", SubgroupTable } : ["14.2.1.1", SubgroupTable];
        var unchanged = study.TableIds.Where(id => !changed.Contains(id)).ToList();
        Assert.Contains($"Tables unchanged: {unchanged.Count}: {string.Join(", ", unchanged)}", output);
        Assert.Matches(@"responders / qf-217-10-mg / n \(Responders, n \(%\) / QF-217 10 mg\): (\d+) -> \d+", output);
        using var workbook = new XLWorkbook(report);
        var numbers = workbook.Worksheet("Numbers");
        var subgroupNumbers = OutputForge.Workflow.Changes.RunComparison.Compare(demo.Before, demo.After).ChangedTables
            .Single(t => t.Id == SubgroupTable).Numbers.Count;
        Assert.Equal(1 + changed.Where(id => id != SubgroupTable).Sum(id => AffectedNumbersOf(id).Length) + subgroupNumbers, numbers.LastRowUsed().RowNumber());
        Assert.True(File.Exists(Path.ChangeExtension(report, ".txt")));
    }

    [Fact]
    public void ARunComparedWithItselfHasNoChanges()
    {
        var changes = OutputForge.Workflow.Changes.RunComparison.Compare(demo.Before, demo.Before);

        Assert.Empty(changes.ChangedInputs);
        Assert.Empty(changes.ChangedTables);
        Assert.Equal(DemoStudyTables.Read().TableIds.Count, changes.Tables.Count);
    }

    [Fact]
    public void TablesNoLongerProducedAreListed()
    {
        using var folder = new OutputForge.Tests.Support.TempFolder();
        var output = folder.File("subset");
        Assert.Equal(0, WorkflowDemoFixture.Run(["run", "--spec", Path.Combine(demo.Root, "specs", "demo"), "--data", demo.Data,
            "--out", output, "--format", "txt", "--tables", "14.2.1.1"]).ExitCode);

        var changes = OutputForge.Workflow.Changes.RunComparison.Compare(demo.Before, output);

        Assert.Equal(DemoStudyTables.Read().TableIds.Where(id => id != "14.2.1.1"),
            changes.Tables.Where(t => t.Status == OutputForge.Workflow.Changes.ChangeStatus.Removed).Select(t => t.Id).ToArray());
        Assert.Equal(OutputForge.Workflow.Changes.ChangeStatus.Unchanged, changes.Tables.Single(t => t.Id == "14.2.1.1").Status);
        Assert.Empty(changes.ChangedInputs);
    }
}
