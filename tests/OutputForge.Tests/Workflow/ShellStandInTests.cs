using OutputForge.Analysis;
using OutputForge.Spec;
using OutputForge.Tests.Support;
using OutputForge.Workflow.Shells;
using OutputForge.Results;

namespace OutputForge.Tests.Workflow;

/// <summary>The stand-in records of each demo table: every statistic its analysis lays out can be estimated from them.</summary>
public sealed class ShellStandInTests
{
    public static TheoryData<string> DemoTableIds() => [.. DemoStudyTables.Read().TableIds];

    [Theory]
    [MemberData(nameof(DemoTableIds))]
    public void EveryStatisticOfTheStandInsIsEstimable(string id)
    {
        var package = SpecLoader.Load(Path.Combine(RepositoryRoot.Path, "specs", "demo"));
        var table = package.Tables.Single(t => t.Id == id);

        var records = ShellData.For(package.Study, table);
        var result = OutputForge.Kinds.TableKinds.For(table).Analysis.Analyze(package.Study, table, records.ToStudyData());

        var notEstimable = result.Rows.SelectMany(r => r.Cells.SelectMany(c => c.Values
                .Where(v => v.NotEstimableReason is not null).Select(v => $"{r.Key} {c.Column} {v.Statistic}: {v.NotEstimableReason}")))
            .ToList();
        // A test across the arms of a single level (a placeholder level) has nothing to compare; its cell keeps its shape.
        // So is an interaction test across the single placeholder level of a subgroup variable whose levels the spec does not list.
        var expected = id switch
        {
            "14.1.3" => new[] { "race p-value pValue" },
            "14.2.5.1" => ["agegr1/interaction qf-217-10-mg-vs-placebo pValue", "agegr1/interaction qf-217-30-mg-vs-placebo pValue",
                "region1/interaction qf-217-10-mg-vs-placebo pValue", "region1/interaction qf-217-30-mg-vs-placebo pValue"],
            _ => [],
        };
        Assert.Equal(expected, notEstimable.Select(n => n[..n.IndexOf(':')]));
        var perArm = OutputForge.Kinds.TableKinds.Find(table.Kind)!.StandIn.SubjectsPerArm(table);
        Assert.All(result.Columns.Where(c => c.SubjectCount is not null), c => Assert.Equal(perArm * (c.Key == ResultKey.Total ? 3 : 1), c.SubjectCount));
    }
}
