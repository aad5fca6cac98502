using OutputForge.Kinds.Responders;
using OutputForge.Kinds.Subgroups;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Oracles;

namespace OutputForge.Tests.Subgroups;

/// <summary>
/// The subgroup kind against R 4.2.2 (Oracles/generate_subgroup_oracles.R, run on the default demo
/// study and on the CDISC pilot study): responders n/N (%), the Newcombe difference built from R's
/// Wilson intervals, and the interaction likelihood-ratio test from glm + anova(test = "LRT"). And
/// against the "responders" kind itself: each subgroup row equals that kind run on the subset.
/// </summary>
public sealed class SubgroupOracleTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    private const string TableId = "14.2.5.1";

    private (StudySpec Study, TableSpec Table, StudyData Data) Demo()
    {
        Assert.True(demo.ExitCode == 0, demo.Log);
        var package = SpecLoader.Load(Path.Combine(demo.Root, "specs", "demo", "study.json"));
        var table = package.Tables.Single(t => t.Id == TableId);
        return (package.Study, table, StudyData.Load(package.Study, Path.Combine(demo.Root, "data")));
    }

    [Fact]
    public void The_demo_subgroup_table_agrees_with_R()
    {
        var (study, table, data) = Demo();
        var result = new SubgroupAnalysis().Analyze(study, table, data);
        DemoEfficacyOracle.AssertAgrees(result, "demo_subgroup_oracles.json", TableId, 1e-9);
        Assert.Empty(OutputForge.Layout.TableNotes.Of(result).Warnings);
    }

    [PilotDataFact]
    public void CIBIC_improvement_by_age_group_and_sex_in_the_pilot_study_agrees_with_R()
    {
        var result = PilotStudy.Analyze(new SubgroupAnalysis(), """
            {
              "id": "P1", "title": ["CIBIC+ improved at Week 24 by subgroup"], "population": "efficacy", "kind": "subgroups",
              "endpoint": { "dataset": "adqscibc", "parameter": "CIBICVAL", "visit": "Week 24", "where": "ANL01FL = 'Y'",
                            "response": "AVAL <= 3", "missing": "exclude", "label": "CIBIC+ improved" },
              "subgroups": { "variables": [ { "variable": "AGEGR1" }, { "variable": "SEX" } ] }
            }
            """);
        DemoEfficacyOracle.AssertAgrees(result, "pilot_subgroup_oracles.json", "pilot-cibic-subgroups", 1e-9);
    }

    [Theory]
    [InlineData("SEX = 'F'", "sex/f")]
    [InlineData("SEX = 'M'", "sex/m")]
    [InlineData("AGEGR1 = '<65'", "agegr1/lt-65")]
    [InlineData("AGEGR1 = '>=65'", "agegr1/ge-65")]
    [InlineData("REGION1 = 'Europe'", "region1/europe")]
    public void A_subgroup_row_equals_the_responders_kind_run_on_that_subset(string subset, string row)
    {
        var (study, table, data) = Demo();
        var subgroups = new SubgroupAnalysis().Analyze(study, table, data);
        var responders = new ResponderAnalysis().Analyze(study, new TableSpec
        {
            Id = table.Id, Title = table.Title, Population = table.Population, Kind = "responders", Subset = subset,
            Endpoint = table.Endpoint, Statistics = table.Statistics, Source = table.Source,
        }, data);
        double? Get(TableResult t, string r, string c, string s) =>
            t.Rows.Single(x => x.Key == r).Cells.Single(x => x.Column == c).Values.Single(v => v.Statistic == s).Value;
        foreach (var arm in new[] { "placebo", "qf-217-10-mg", "qf-217-30-mg" })
        {
            Assert.Equal(Get(responders, "responders", arm, "n"), Get(subgroups, row, arm, "n"));
            Assert.Equal(Get(responders, "responders", arm, "N"), Get(subgroups, row, arm, "N"));
            Assert.Equal(Get(responders, "responders", arm, "percent"), Get(subgroups, row, arm, "percent"));
        }
        foreach (var arm in new[] { "qf-217-10-mg", "qf-217-30-mg" })
        {
            var column = arm + "-vs-placebo";
            Assert.Equal(Get(responders, "difference", arm, "estimate"), Get(subgroups, row, column, "estimate"));
            Assert.Equal(Get(responders, "difference-ci", arm, "lower"), Get(subgroups, row, column, "lower"));
            Assert.Equal(Get(responders, "difference-ci", arm, "upper"), Get(subgroups, row, column, "upper"));
        }
    }
}
