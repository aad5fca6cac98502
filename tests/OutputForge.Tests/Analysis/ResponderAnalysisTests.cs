using OutputForge.Kinds.Responders;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Analysis;

/// <summary>The responder table's counting rules on a hand-countable study (invented subjects).</summary>
public sealed class ResponderAnalysisTests
{
    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new ResponderAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static double? Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value;

    [Fact]
    public void Counts_responders_of_the_population_per_arm()
    {
        using var study = new MiniStudy();
        var result = Analyze(study);
        // Placebo: T1-001 no, T1-002 yes. Active: T1-003 and T1-004 yes; T1-005 is outside the ITT population.
        Assert.Equal(["placebo", "active"], result.Columns.Select(c => c.Key));
        Assert.Equal([2, 2], result.Columns.Select(c => c.SubjectCount!.Value));
        Assert.Equal(1, Value(result, "responders", "placebo", "n"));
        Assert.Equal(50, Value(result, "responders", "placebo", "percent"));
        Assert.Equal(2, Value(result, "responders", "active", "n"));
        Assert.Equal(100, Value(result, "responders", "active", "percent"));
        Assert.Equal(50, Value(result, "difference", "active", "estimate")!.Value, 12);
    }

    [Fact]
    public void Small_expected_counts_switch_to_fisher_and_say_so()
    {
        using var study = new MiniStudy();
        var result = Analyze(study);
        var pValue = result.Rows.Single(r => r.Key == "p-value").Cells.Single(c => c.Column == "active").Values[0];
        Assert.Equal("Fisher's exact test", pValue.Method);
        // Table [[2, 0], [1, 1]]: both possible tables have probability 1/2, so the two-sided p is 1 (hand computation).
        Assert.Equal(1.0, pValue.Value!.Value, 12);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.Contains("Fisher's exact test was used for every comparison"));
    }

    [Fact]
    public void Missing_records_count_as_non_responders_or_are_excluded_as_the_spec_says()
    {
        var adeffWithoutOne = MiniStudy.Adeff.Replace("T1,T1-004,RESP,Week 4,Y,Y\n", string.Empty);
        using var imputed = new MiniStudy(adeff: adeffWithoutOne);
        var asNonResponder = Analyze(imputed);
        Assert.Equal(1, Value(asNonResponder, "responders", "active", "n"));
        Assert.Equal(50, Value(asNonResponder, "responders", "active", "percent"));
        Assert.Equal(1, Value(asNonResponder, "missing", "active", "n"));

        using var excluded = new MiniStudy(adeff: adeffWithoutOne,
            table: MiniStudy.TableJson.Replace("\"response\": \"AVALC = 'Y'\"", "\"response\": \"AVALC = 'Y'\", \"missing\": \"exclude\""));
        var observed = Analyze(excluded);
        Assert.Equal(1, Value(observed, "responders", "active", "N"));
        Assert.Equal(100, Value(observed, "responders", "active", "percent"));
        Assert.Equal(1, Value(observed, "evaluated", "active", "n"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(observed).Footnotes, n => n.Contains("are excluded"));
    }

    [Theory]
    // Table [[2, 0], [1, 1]] (active, placebo). Yates: n (|ad - bc| - n/2)^2 / (r1 r2 c1 c2) = 4 (2 - 2)^2 / 12 = 0, p = 1
    // (hand computation; R 4.2.2 chisq.test(correct = TRUE) gives p = 1). Likelihood ratio: G^2 = 2 sum O ln(O/E) with
    // E = [[1.5, 0.5], [1.5, 0.5]] = 1.72609243471069 (hand computation), p = 0.188910700005692 (R 4.2.2 pchisq).
    [InlineData("yates", "Pearson's chi-square test with Yates' continuity correction", 0.0, 1.0)]
    [InlineData("likelihood-ratio", "Likelihood-ratio chi-square test", 1.72609243471069, 0.188910700005692)]
    public void The_spec_can_name_the_yates_or_likelihood_ratio_test(string choice, string method, double statistic, double p)
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"kind\": \"responders\",",
            $"\"kind\": \"responders\", \"statistics\": {{ \"test\": \"{choice}\" }},"));
        var result = Analyze(study);
        var cell = result.Rows.Single(r => r.Key == "p-value").Cells.Single(c => c.Column == "active");
        var pValue = cell.Values.Single(v => v.Statistic == StatisticNames.PValue);
        Assert.Equal(method, pValue.Method);
        Assert.Equal(p, pValue.Value!.Value, 12);
        Assert.Equal(statistic, cell.Values.Single(v => v.Statistic == StatisticNames.TestStatistic).Value!.Value, 12);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.Contains(choice == "yates" ? "Yates' continuity correction, unstratified" : "likelihood-ratio chi-square test, unstratified"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("chi-square approximation may be poor"));
    }

    [Fact]
    public void Forcing_chi_square_on_small_counts_warns()
    {
        using var study = new MiniStudy(table: MiniStudy.TableJson.Replace("\"kind\": \"responders\",",
            "\"kind\": \"responders\", \"statistics\": { \"test\": \"chi-square\" },"));
        var result = Analyze(study);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("expected cell counts are below 5") && w.Contains("chi-square approximation may be poor"));
    }

    [Fact]
    public void Subjects_without_an_arm_are_left_out_with_a_warning()
    {
        using var study = new MiniStudy(adsl: MiniStudy.Adsl + "T1,T1-006,,,Y,50\n");
        var result = Analyze(study);
        Assert.Equal(4, result.Columns.Sum(c => c.SubjectCount));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("1 subject of the population with no value of TRT01P is not counted"));
    }
}
