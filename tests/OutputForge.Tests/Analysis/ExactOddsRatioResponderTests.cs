using System.Globalization;
using System.Text;
using OutputForge.Kinds.Responders;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Analysis;

/// <summary>The responder table's odds ratio rows with the exact conditional interval ("oddsRatioInterval": "exact").</summary>
public sealed class ExactOddsRatioResponderTests
{
    private static string Table(string settings) =>
        MiniStudy.TableJson.Replace("\"response\": \"AVALC = 'Y'\"\n  }", $"\"response\": \"AVALC = 'Y'\"\n  }},\n  \"responders\": {settings}");

    private const string Exact = "{ \"ratios\": [\"odds-ratio\"], \"oddsRatioInterval\": \"exact\" }";

    /// <summary>Active 4 of 5 responders, Placebo 2 of 5 (invented subjects).</summary>
    private static (string Adsl, string Adeff) FourOfFiveVersusTwoOfFive()
    {
        var adsl = new StringBuilder("STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL\n");
        var adeff = new StringBuilder("STUDYID,USUBJID,PARAMCD,AVISIT,AVALC,ANL01FL\n");
        for (var i = 1; i <= 10; i++)
        {
            var active = i > 5;
            var responder = active ? i <= 9 : i <= 2;
            adsl.Append(CultureInfo.InvariantCulture, $"T1,T1-{i:000},{(active ? "Active,1" : "Placebo,0")},Y\n");
            adeff.Append(CultureInfo.InvariantCulture, $"T1,T1-{i:000},RESP,Week 4,{(responder ? "Y" : "N")},Y\n");
        }
        return (adsl.ToString(), adeff.ToString());
    }

    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        return new ResponderAnalysis().Analyze(package.Study, package.Tables[0], StudyData.Load(package.Study, study.DataFolder));
    }

    private static StatisticValue Value(TableResult result, string row, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == "active").Values.Single(v => v.Statistic == statistic);

    [Fact]
    public void The_exact_interval_is_the_conditional_one()
    {
        var (adsl, adeff) = FourOfFiveVersusTwoOfFive();
        using var study = new MiniStudy(table: Table(Exact), adsl: adsl, adeff: adeff);
        var result = Analyze(study);
        // Reference: R 4.2.2, the conditional equations (noncentral hypergeometric from dhyper, 2.5% tail each side, mean equal
        // to the observed cell for the MLE) solved by uniroot on log(theta) with tol = 1e-14: MLE 4.91837380038, 95% CI
        // 0.218049513241 to 391.992373383. R's own fisher.test prints 4.918388, 0.218046 to 390.5629: it solves the same
        // equations with uniroot's default tolerance (on 1/theta for the upper limit), so only its first digits agree.
        Assert.Equal(4.91837380038, Value(result, "odds-ratio", "estimate").Value!.Value, 4.91837380038 * 1e-8);
        Assert.Equal(0.218049513241, Value(result, "odds-ratio-ci", "lower").Value!.Value, 0.218049513241 * 1e-8);
        Assert.Equal(391.992373383, Value(result, "odds-ratio-ci", "upper").Value!.Value, 391.992373383 * 1e-8);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.Contains("exact conditional (Cornfield)"));
    }

    [Fact]
    public void An_infinite_conditional_estimate_is_not_estimable_with_its_reason()
    {
        // MiniStudy: Active 2 of 2 responders, Placebo 1 of 2: the conditional MLE is infinite.
        using var study = new MiniStudy(table: Table(Exact));
        var result = Analyze(study);
        Assert.Contains("infinite", Value(result, "odds-ratio", "estimate").NotEstimableReason);
        Assert.NotNull(Value(result, "odds-ratio-ci", "lower").NotEstimableReason);
    }

    [Fact]
    public void A_stratified_table_refuses_the_exact_interval_with_a_located_error()
    {
        using var study = new MiniStudy(table: Table(
            "{ \"stratified\": { \"strata\": [\"AGE\"] }, \"ratios\": [\"odds-ratio\"], \"oddsRatioInterval\": \"exact\" }"));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Contains("responders.oddsRatioInterval", error.Message);
        Assert.Contains("unstratified", error.Message);
    }
}
