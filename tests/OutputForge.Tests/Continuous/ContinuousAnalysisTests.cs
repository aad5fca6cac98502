using OutputForge.Kinds.Continuous;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Continuous;

/// <summary>The continuous kind on hand-countable invented studies: summaries, the model, and what it refuses to print.</summary>
public sealed class ContinuousAnalysisTests
{
    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,SITEGR\n" +
        "T1,T1-001,Placebo,0,Y,A\nT1,T1-002,Placebo,0,Y,B\nT1,T1-003,Placebo,0,Y,A\n" +
        "T1,T1-004,Active,1,Y,B\nT1,T1-005,Active,1,Y,A\nT1,T1-006,Active,1,Y,B\n";

    private const string Adeff =
        "STUDYID,USUBJID,PARAMCD,AVISIT,BASE,AVAL,CHG\n" +
        "T1,T1-001,X,Week 4,5,4,-1\nT1,T1-002,X,Week 4,6,4,-2\nT1,T1-003,X,Week 4,7,4,-3\n" +
        "T1,T1-004,X,Week 4,6,3,-3\nT1,T1-005,X,Week 4,7,3,-4\nT1,T1-006,X,Week 4,9,1,-8\n";

    private static string Table(string model) => $$"""
        {
          "id": "1", "title": ["Change"], "population": "itt", "kind": "continuous",
          "endpoint": { "dataset": "adeff", "parameter": "X" },
          "continuous": { "visits": ["Week 4"], "decimals": 0, "model": {{model}} }
        }
        """;

    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new ContinuousAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static double? Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value;

    [Fact]
    public void Summaries_and_a_treatment_only_model_agree_with_hand_computation()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table("{}"));
        var result = Analyze(study);
        // Hand computation: Placebo changes -1, -2, -3 (mean -2, SD 1); Active -3, -4, -8 (mean -5, SD sqrt(7)).
        Assert.Equal(3, Value(result, "week-4/change/n", "active", "n"));
        Assert.Equal(-5, Value(result, "week-4/change/mean-sd", "active", "mean")!.Value, 12);
        Assert.Equal(Math.Sqrt(7), Value(result, "week-4/change/mean-sd", "active", "sd")!.Value, 12);
        Assert.Equal(-4, Value(result, "week-4/change/median", "active", "median"));
        Assert.Equal(-8, Value(result, "week-4/change/min-max", "active", "min"));
        // With treatment alone the LS means are the arm means; the pooled SD is sqrt((2*1 + 2*7)/4) = 2,
        // so the SE of the difference is 2 sqrt(1/3 + 1/3) on 4 df (one-way ANOVA, any linear models text).
        Assert.Equal(-2, Value(result, "week-4/lsmean", "placebo", "estimate")!.Value, 12);
        Assert.Equal(2 / Math.Sqrt(3), Value(result, "week-4/lsmean", "placebo", "se")!.Value, 12);
        Assert.Equal(-3, Value(result, "week-4/lsdiff", "active", "estimate")!.Value, 12);
        Assert.Equal(2 * Math.Sqrt(2.0 / 3), Value(result, "week-4/lsdiff", "active", "se")!.Value, 12);
        var t = -3 / (2 * Math.Sqrt(2.0 / 3));
        Assert.Equal(4, Value(result, "week-4/lsdiff-p-value", "active", "df"));
        Assert.Equal(t, Value(result, "week-4/lsdiff-p-value", "active", "statistic")!.Value, 12);
        // Two-sided p of that t on 4 df: R 4.2.2, 2 * pt(-3 / (2 * sqrt(2/3)), 4) = 0.14006598491201774.
        Assert.Equal(0.14006598491201774, Value(result, "week-4/lsdiff-p-value", "active", "pValue")!.Value, 12);
    }

    [Fact]
    public void A_factor_collinear_with_treatment_is_reported_not_estimated()
    {
        // ARMGRP repeats the arm, so the design is rank deficient.
        var adsl = Adsl.Replace("SITEGR\n", "SITEGR,ARMGRP\n").Replace("Placebo,0,Y,A\n", "Placebo,0,Y,A,P\n")
            .Replace("Placebo,0,Y,B\n", "Placebo,0,Y,B,P\n").Replace("Active,1,Y,B\n", "Active,1,Y,B,Q\n").Replace("Active,1,Y,A\n", "Active,1,Y,A,Q\n");
        using var study = new MiniStudy(adsl: adsl, adeff: Adeff, table: Table("""{ "factors": ["ARMGRP"] }"""));
        var result = Analyze(study);
        Assert.Null(Value(result, "week-4/lsmean", "placebo", "estimate"));
        Assert.Null(Value(result, "week-4/lsdiff", "active", "estimate"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("the ANCOVA could not be fitted") && w.Contains("rank deficient"));
    }

    [Fact]
    public void An_arm_without_data_at_the_visit_gets_no_ls_mean_and_a_warning()
    {
        var adeff = string.Join("\n", Adeff.Split('\n').Where(l => !l.Contains("T1-00") || string.CompareOrdinal(l.Split(',')[1], "T1-004") < 0)) + "\n";
        using var study = new MiniStudy(adsl: Adsl, adeff: adeff, table: Table("""{ "covariates": ["BASE"] }"""));
        var result = Analyze(study);
        Assert.Null(Value(result, "week-4/lsmean", "active", "estimate"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("the ANCOVA could not be fitted") && w.Contains("fewer than two arms"));
    }

    [Fact]
    public void An_unknown_covariate_is_a_located_spec_error()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table("""{ "covariates": ["BASEE"] }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Contains("BASEE", error.Message);
        Assert.Contains("BASE", error.Message.Replace("BASEE", ""));
    }

    [Fact]
    public void Baseline_covariate_and_dose_response_give_estimates()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table("""{ "covariates": ["BASE"], "doseVariable": "TRT01PN" }"""));
        var result = Analyze(study);
        Assert.NotNull(Value(result, "week-4/lsdiff", "active", "estimate"));
        // With two arms and dose 0/1 the dose slope is the LS mean difference itself (same model, recoded).
        Assert.Equal(Value(result, "week-4/lsdiff", "active", "estimate")!.Value, Value(result, "week-4/dose-response", "placebo", "estimate")!.Value, 10);
        Assert.Equal(Value(result, "week-4/lsdiff-p-value", "active", "pValue")!.Value, Value(result, "week-4/dose-response", "placebo", "pValue")!.Value, 10);
    }

    [Fact]
    public void A_text_covariate_is_a_spec_error_that_points_to_factors()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: Table("""{ "covariates": ["SITEGR"] }"""));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Contains("SITEGR", error.Message);
        Assert.Contains("factors", error.Message);
    }

    [Fact]
    public void A_continuous_table_without_its_settings_is_a_schema_error()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adeff, table: """
            { "id": "1", "title": ["Change"], "population": "itt", "kind": "continuous", "endpoint": { "dataset": "adeff" } }
            """);
        var error = Assert.Throws<SpecException>(() => SpecLoader.Load(study.Folder));
        Assert.Contains("continuous", error.Message);
    }
}
