using OutputForge.Kinds.Responders;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Analysis;

/// <summary>
/// The stratified responder rows and the missing-data rules on a hand-countable invented study: strata
/// A / X (Placebo 1/2, Active 2/2), B / X (Placebo 0/1, Active 1/1), B / Y (one Active subject: dropped),
/// A / Y empty, and one Placebo subject without a stratum value. Expected values are hand computations.
/// </summary>
public sealed class StratifiedResponderAnalysisTests
{
    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,STRAT1R,STRAT2R\n" +
        "T1,T1-001,Placebo,0,Y,A,X\n" +
        "T1,T1-002,Placebo,0,Y,A,X\n" +
        "T1,T1-003,Active,1,Y,A,X\n" +
        "T1,T1-004,Active,1,Y,A,X\n" +
        "T1,T1-005,Placebo,0,Y,B,X\n" +
        "T1,T1-006,Active,1,Y,B,X\n" +
        "T1,T1-007,Active,1,Y,B,Y\n" +
        "T1,T1-008,Placebo,0,Y,,X\n";

    private const string Adeff =
        "STUDYID,USUBJID,PARAMCD,AVISIT,AVALC,ANL01FL,DTYPE\n" +
        "T1,T1-001,RESP,Week 4,N,Y,\n" +
        "T1,T1-002,RESP,Week 4,Y,Y,\n" +
        "T1,T1-003,RESP,Week 4,Y,Y,\n" +
        "T1,T1-004,RESP,Week 4,Y,Y,\n" +
        "T1,T1-005,RESP,Week 4,N,Y,\n" +
        "T1,T1-006,RESP,Week 4,Y,Y,LOCF\n" +
        "T1,T1-007,RESP,Week 4,Y,Y,\n";

    private const string Settings =
        "{ \"stratified\": { \"strata\": [\"STRAT1R\", \"STRAT2R\"], \"homogeneity\": true }, \"ratios\": [\"relative-risk\", \"odds-ratio\"] }";

    private static string Table(string settings, string missing = "non-responder") =>
        MiniStudy.TableJson.Replace("\"response\": \"AVALC = 'Y'\"\n  }",
            $"\"response\": \"AVALC = 'Y'\", \"missing\": \"{missing}\"\n  }},\n  \"responders\": {settings}");

    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new ResponderAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static StatisticValue Value(TableResult result, string row, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == "active").Values.Single(v => v.Statistic == statistic);

    [Fact]
    public void Stratified_rows_match_the_hand_computation()
    {
        using var study = new MiniStudy(table: Table(Settings), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        // Weights n1 n2 / T: A / X 2*2/4 = 1, B / X 1*1/2 = 0.5; differences 0.5 and 1; (0.5 + 0.5) / 1.5 = 2/3.
        Assert.Equal(200.0 / 3, Value(result, "stratified-difference", "estimate").Value!.Value, 12);
        // CMH: A / X a - E = 2 - 1.5, V = 2*2*3*1 / (16*3) = 0.25; B / X a - E = 1 - 0.5, V = 0.25; X^2 = 1 / 0.5 = 2.
        Assert.Equal(2, Value(result, "cmh-p-value", "statistic").Value!.Value, 12);
        // P(chi-square(1) > 2) = erfc(1) = 0.15729920705028513 (hand computation, erfc value recalled from memory).
        Assert.Equal(0.15729920705028513, Value(result, "cmh-p-value", "pValue").Value!.Value, 12);
        Assert.Equal(2, Value(result, "cmh-p-value", "strata").Value);
        // Both strata have an arm at 100%: the Mantel-Haenszel odds ratio sum b c / T is 0, so it is not estimable.
        Assert.NotNull(Value(result, "odds-ratio", "estimate").NotEstimableReason);
        // MH RR: sum a n2 / T = 2*2/4 + 1*1/2 = 1.5; sum c n1 / T = 1*2/4 + 0 = 0.5; RR = 3.
        Assert.Equal(3, Value(result, "relative-risk", "estimate").Value!.Value, 12);
    }

    [Fact]
    public void Empty_single_subject_dropped_and_valueless_strata_are_footnoted_and_warned()
    {
        using var study = new MiniStudy(table: Table(Settings), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        string[] expected =
        [
            "Empty stratum (no subject of the population): A / Y.",
            "Stratum with one subject in the population: B / Y.",
            "1 subject has no value of STRAT1R / STRAT2R and is left out of the stratified analysis.",
            "Active vs Placebo: stratum B / Y (1 subject) has no subjects of Placebo and was left out.",
        ];
        // Warnings reach the run log and, through the layout, the footnotes ("Warning: ...").
        foreach (var text in expected)
        {
            Assert.Contains(text, OutputForge.Layout.TableNotes.Of(result).Warnings);
        }
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("[d] Mantel-Haenszel common difference", StringComparison.Ordinal) && n.Contains("Sato"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("Strata: each combination of STRAT1R / STRAT2R values (ADSL)", StringComparison.Ordinal));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("odds ratio", StringComparison.Ordinal) && w.StartsWith("NE (not estimable)", StringComparison.Ordinal));
    }

    [Fact]
    public void A_stratum_the_Breslow_Day_test_leaves_out_is_named_by_its_values_in_the_warning()
    {
        // Invented: A / X has Placebo 1/3 and Active 2/3 responders (odds ratio 4); B / X has one subject per arm and no
        // responder, so no variability: the Breslow-Day test leaves it out (Stats returns its index, the kind its name).
        const string adsl =
            "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,STRAT1R,STRAT2R\n" +
            "T1,T1-001,Placebo,0,Y,A,X\nT1,T1-002,Placebo,0,Y,A,X\nT1,T1-003,Placebo,0,Y,A,X\n" +
            "T1,T1-004,Active,1,Y,A,X\nT1,T1-005,Active,1,Y,A,X\nT1,T1-006,Active,1,Y,A,X\n" +
            "T1,T1-007,Placebo,0,Y,B,X\nT1,T1-008,Active,1,Y,B,X\n";
        const string adeff =
            "STUDYID,USUBJID,PARAMCD,AVISIT,AVALC,ANL01FL,DTYPE\n" +
            "T1,T1-001,RESP,Week 4,Y,Y,\nT1,T1-002,RESP,Week 4,N,Y,\nT1,T1-003,RESP,Week 4,N,Y,\n" +
            "T1,T1-004,RESP,Week 4,Y,Y,\nT1,T1-005,RESP,Week 4,Y,Y,\nT1,T1-006,RESP,Week 4,N,Y,\n" +
            "T1,T1-007,RESP,Week 4,N,Y,\nT1,T1-008,RESP,Week 4,N,Y,\n";
        using var study = new MiniStudy(table: Table(Settings), adsl: adsl, adeff: adeff);
        var result = Analyze(study);
        var note = Assert.Single(result.Notes, n => n.Kind == NoteKind.StratumLeftOut);
        Assert.Equal(["B / X"], note.Subject.Stratum);
        Assert.Contains("Active vs Placebo: Stratum B / X has no events, so no variability, and was left out of the Breslow-Day test.",
            OutputForge.Layout.TableNotes.Of(result).Warnings);
        Assert.DoesNotContain(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("Stratum 2", StringComparison.Ordinal));
    }

    [Fact]
    public void Miettinen_nurminen_choice_uses_the_stratified_score_interval()
    {
        using var study = new MiniStudy(table: Table(Settings.Replace("\"homogeneity\": true", "\"difference\": \"miettinen-nurminen\"")), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        Assert.Equal(Stats.Stratified.StratifiedMiettinenNurminen.MethodName, Value(result, "stratified-difference-ci", "lower").Method);
        var interval = Stats.Stratified.StratifiedMiettinenNurminen.Compute([new(2, 2, 1, 2), new(1, 1, 0, 1)]);
        Assert.Equal(100 * interval.Lower, Value(result, "stratified-difference-ci", "lower").Value!.Value, 12);
        Assert.DoesNotContain(result.Rows, r => r.Key == "homogeneity-p-value");
    }

    [Fact]
    public void Unstratified_ratios_use_katz_and_woolf()
    {
        using var study = new MiniStudy(table: Table(Settings.Replace("\"stratified\": { \"strata\": [\"STRAT1R\", \"STRAT2R\"], \"homogeneity\": true }, ", "")), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        // Active 4/4 vs Placebo 1/4 (T1-008 has no record: a non-responder): RR = 1 / 0.25 = 4; the Woolf odds ratio has a zero cell.
        Assert.Equal(4, Value(result, "relative-risk", "estimate").Value!.Value, 12);
        Assert.Equal("Katz log", Value(result, "relative-risk", "estimate").Method);
        Assert.NotNull(Value(result, "odds-ratio", "estimate").NotEstimableReason);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("[d] Relative risk", StringComparison.Ordinal));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("[e] Odds ratio", StringComparison.Ordinal) && n.Contains("Woolf"));
    }

    [Fact]
    public void Observed_cases_leave_out_subjects_without_a_record_and_count_derived_records()
    {
        using var study = new MiniStudy(table: Table(Settings, "observed"), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        Assert.Equal(1, result.Rows.Single(r => r.Key == "derived").Cells.Single(c => c.Column == "active").Values[0].Value);
        Assert.Equal(3, result.Rows.Single(r => r.Key == "evaluated").Cells.Single(c => c.Column == "placebo").Values[0].Value);
        Assert.Equal(3, result.Rows.Single(r => r.Key == "responders").Cells.Single(c => c.Column == "placebo").Values.Single(v => v.Statistic == "N").Value);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.Contains("observed cases") && n.Contains("DTYPE not blank") && n.Contains("subjects without a record are left out"));
    }

    [Fact]
    public void Excluded_and_observed_give_the_same_counts_but_different_statements()
    {
        using var observed = new MiniStudy(table: Table(Settings, "observed"), adsl: Adsl, adeff: Adeff);
        using var excluded = new MiniStudy(table: Table(Settings, "exclude"), adsl: Adsl, adeff: Adeff);
        var a = Analyze(observed);
        var b = Analyze(excluded);
        Assert.Equal(Value(a, "stratified-difference", "estimate").Value, Value(b, "stratified-difference", "estimate").Value);
        Assert.DoesNotContain(b.Rows, r => r.Key == "derived");
        Assert.Contains(OutputForge.Layout.TableNotes.Of(b).Footnotes, n => n.Contains("Subjects with no assessment are excluded."));
    }

    [Fact]
    public void No_stratum_with_both_arms_makes_the_stratified_values_not_estimable_with_the_reason()
    {
        // STRAT1R equal to the arm: every stratum holds one arm only.
        var adsl = Adsl.Replace(",A,X\n", ",P,X\n").Replace("Active,1,Y,P,X", "Active,1,Y,Q,X").Replace(",B,X\n", ",P,X\n").Replace("Active,1,Y,P,X", "Active,1,Y,Q,X")
            .Replace("Active,1,Y,B,Y", "Active,1,Y,Q,Y");
        using var study = new MiniStudy(table: Table(Settings), adsl: adsl, adeff: Adeff);
        var result = Analyze(study);
        Assert.Equal("no stratum has subjects in both groups", Value(result, "stratified-difference", "estimate").NotEstimableReason);
        Assert.Equal("no stratum has subjects in both groups", Value(result, "cmh-p-value", "pValue").NotEstimableReason);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("stratum P / X", StringComparison.Ordinal) && w.Contains("no subjects of Active"));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.StartsWith("NE (not estimable) in \"CMH p-value [e]\"", StringComparison.Ordinal));
    }

    [Fact]
    public void Corrected_cmh_subtracts_a_half_and_says_so()
    {
        using var study = new MiniStudy(table: Table(Settings.Replace("\"homogeneity\": true", "\"test\": \"cmh-corrected\"")), adsl: Adsl, adeff: Adeff);
        var result = Analyze(study);
        // sum (a - E) = 1 and sum V = 0.5 (see above): (1 - 0.5)^2 / 0.5 = 0.5, hand computation.
        Assert.Equal(0.5, Value(result, "cmh-p-value", "statistic").Value!.Value, 12);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, n => n.StartsWith("[e] ", StringComparison.Ordinal) && n.Contains("with continuity correction"));
    }
}
