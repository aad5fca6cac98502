using OutputForge.Tests.Support;
using OutputForge.Workflow.Changes;

namespace OutputForge.Tests.Workflow;

/// <summary>The `changes` text report: one line per changed number, and the default report inside the --after folder.</summary>
public sealed class ChangesReportTests(WorkflowDemoFixture demo) : IClassFixture<WorkflowDemoFixture>
{
    private static void Copy(string from, string to)
    {
        Directory.CreateDirectory(to);
        foreach (var file in Directory.GetFiles(from))
        {
            File.Copy(file, Path.Combine(to, Path.GetFileName(file)));
        }
    }

    [Fact]
    public void Multi_line_labels_keep_one_line_per_number_and_the_report_goes_inside_the_after_folder()
    {
        using var folder = new TempFolder();
        var before = folder.File("runs/before");
        var after = folder.File("runs/after");
        Copy(demo.Before, before);
        Copy(demo.After, after);
        var changes = RunComparison.Compare(before, after);
        var numbers = changes.ChangedTables.SelectMany(t => t.Numbers).ToList();
        // The test needs a changed number whose label has several lines (a column header over its "(N=xx)").
        Assert.Contains(numbers, n => n.Before.ColumnLabel.Contains('\n') || n.Before.RowLabel.Contains('\n'));

        var (code, output, error) = WorkflowDemoFixture.Run(["changes", "--before", before, "--after", after]);

        Assert.True(code == 0, output + error);
        var lines = output.Split('\n').Select(l => l.TrimEnd('\r')).ToList();
        var numberLines = lines.Where(l => l.StartsWith("    ", StringComparison.Ordinal) && l.Contains(" -> ", StringComparison.Ordinal)).ToList();
        static string Flat(string label) => string.Join(" ", label.Split('\n', StringSplitOptions.TrimEntries));
        var expected = numbers.Select(n =>
            $"    {n.Before.Row} / {n.Before.Column} / {n.Before.Statistic} ({Flat(n.Before.RowLabel)} / {Flat(n.Before.ColumnLabel)}): {n.Before.Formatted} -> {n.After.Formatted}");
        Assert.Equal(expected.Order(StringComparer.Ordinal), numberLines.Order(StringComparer.Ordinal));
        Assert.True(File.Exists(Path.Combine(after, "changes.xlsx")));
        Assert.True(File.Exists(Path.Combine(after, "changes.txt")));
        Assert.False(File.Exists(folder.File("runs/changes.xlsx")));
    }
}
