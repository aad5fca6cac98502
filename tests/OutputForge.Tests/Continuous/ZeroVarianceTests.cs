using OutputForge.Kinds.Continuous;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Continuous;

/// <summary>
/// A continuous endpoint whose analysed values are all equal: the ANCOVA's residual variance is rounding noise, so the
/// LS means' standard errors, the differences' intervals and the p-values are NE, with the reason as a warning (which
/// the table prints as a footnote), instead of numbers made of noise (the case reported: p = 0.328).
/// </summary>
public sealed class ZeroVarianceTests
{
    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL\n" +
        "T1,T1-001,Placebo,0,Y\nT1,T1-002,Placebo,0,Y\nT1,T1-003,Placebo,0,Y\nT1,T1-004,Placebo,0,Y\n" +
        "T1,T1-005,Active,1,Y\nT1,T1-006,Active,1,Y\nT1,T1-007,Active,1,Y\nT1,T1-008,Active,1,Y\n";

    private static string Adeff(Func<int, string> change) => "STUDYID,USUBJID,PARAMCD,AVISIT,BASE,AVAL,CHG\n" + string.Concat(
        Enumerable.Range(1, 8).Select(i => $"T1,T1-00{i},X,Week 4,{3 + 0.7 * i:0.0},{3 + 0.7 * i - 1.5:0.0},{change(i)}\n"));

    private const string Table = """
        {
          "id": "1", "title": ["Change"], "population": "itt", "kind": "continuous",
          "endpoint": { "dataset": "adeff", "parameter": "X" },
          "continuous": { "visits": ["Week 4"], "decimals": 1, "model": { "covariates": ["BASE"] } }
        }
        """;

    private static TableResult Analyze(string adeff)
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: adeff, table: Table);
        var package = SpecLoader.Load(study.Folder);
        return new ContinuousAnalysis().Analyze(package.Study, package.Tables[0], StudyData.Load(package.Study, study.DataFolder));
    }

    private static StatisticValue Statistic(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic);

    [Fact]
    public void Equal_changes_give_no_p_value_and_say_why()
    {
        var result = Analyze(Adeff(_ => "-1.5"));
        var p = Statistic(result, "week-4/lsdiff-p-value", "active", "pValue");
        Assert.Null(p.Value);
        Assert.Contains("the variance is zero up to rounding", p.NotEstimableReason);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("Week 4: the ANCOVA could not be fitted: the variance is zero up to rounding"));
        // The descriptive rows still show the values: mean -1.5, SD 0.
        Assert.Equal(-1.5, Statistic(result, "week-4/change/mean-sd", "active", "mean").Value);
        Assert.Equal(0, Statistic(result, "week-4/change/mean-sd", "active", "sd").Value);
    }

    [Fact]
    public void Changes_that_vary_keep_their_p_value()
    {
        var result = Analyze(Adeff(i => i % 3 == 0 ? "-1.4" : "-1.5"));
        Assert.NotNull(Statistic(result, "week-4/lsdiff-p-value", "active", "pValue").Value);
        Assert.DoesNotContain(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("zero up to rounding"));
    }
}
