using OutputForge.Layout;
using OutputForge.Kinds.TimeToEvent;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.TimeToEvent;

/// <summary>The time-to-event kind on hand-countable invented studies.</summary>
public sealed class TimeToEventAnalysisTests
{
    private const string Adsl =
        "STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,REG\n" +
        "T1,T1-001,Placebo,0,Y,A\nT1,T1-002,Placebo,0,Y,B\nT1,T1-003,Placebo,0,Y,A\nT1,T1-004,Placebo,0,Y,B\n" +
        "T1,T1-005,Active,1,Y,A\nT1,T1-006,Active,1,Y,B\nT1,T1-007,Active,1,Y,A\nT1,T1-008,Active,1,Y,\n";

    private const string Adtte =
        "STUDYID,USUBJID,PARAMCD,AVAL,CNSR\n" +
        "T1,T1-001,TTE,2,0\nT1,T1-002,TTE,4,0\nT1,T1-003,TTE,6,1\nT1,T1-004,TTE,8,0\n" +
        "T1,T1-005,TTE,3,0\nT1,T1-006,TTE,5,1\nT1,T1-007,TTE,9,0\nT1,T1-008,TTE,10,1\n";

    private static string Table(string settings) => $$"""
        {
          "id": "1", "title": ["Time to event"], "population": "itt", "kind": "time-to-event",
          "endpoint": { "dataset": "adeff", "parameter": "TTE" },
          "timeToEvent": {{settings}}
        }
        """;

    private static TableResult Analyze(MiniStudy study)
    {
        var package = SpecLoader.Load(study.Folder);
        var data = StudyData.Load(package.Study, study.DataFolder);
        return new TimeToEventAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static double? Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value;

    [Fact]
    public void Counts_and_kaplan_meier_values_agree_with_hand_computation()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adtte, table: Table("""{ "times": [5, 20] }"""));
        var result = Analyze(study);
        Assert.Equal(3, Value(result, "events", "placebo", "n"));
        Assert.Equal(1, Value(result, "censored", "placebo", "n"));
        // Placebo, product limit (Kaplan and Meier 1958): S(2) = 3/4, S(4) = 3/4 * 2/3 = 1/2, flat at 1/2 until the
        // event at 8 (the censoring at 6 leaves one at risk), so the median is the midpoint (4 + 8)/2 = 6 (R survival rule).
        Assert.Equal(50, Value(result, "km-at-5", "placebo", "estimate")!.Value, 10);
        Assert.Equal(6, Value(result, "median", "placebo", "median"));
        // Day 20 is beyond every subject's time: not estimable, and the reason is kept.
        Assert.Null(Value(result, "km-at-20", "placebo", "estimate"));
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.Contains("beyond the last observed time"));
        Assert.NotNull(Value(result, "hazard-ratio", "active", "estimate"));
    }

    [Fact]
    public void An_arm_without_events_gives_no_hazard_ratio_and_says_why()
    {
        var adtte = Adtte.Replace("T1-005,TTE,3,0", "T1-005,TTE,3,1").Replace("T1-007,TTE,9,0", "T1-007,TTE,9,1");
        using var study = new MiniStudy(adsl: Adsl, adeff: adtte, table: Table("{}"));
        var result = Analyze(study);
        Assert.Null(Value(result, "hazard-ratio", "active", "estimate"));
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.Contains("no events in Active") && w.Contains("monotone"));
    }

    [Fact]
    public void Subjects_without_a_stratum_value_are_left_out_with_a_warning()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adtte, table: Table("""{ "strata": ["REG"] }"""));
        var result = Analyze(study);
        Assert.Equal(3, Value(result, "analysed", "active", "n"));
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.Contains("1 subject has no value of REG"));
        Assert.Contains(TableNotes.Of(result).Footnotes, n => n.Contains("stratified by REG"));
    }

    [Fact]
    public void A_stratum_that_adds_nothing_to_the_log_rank_test_is_named_by_its_value()
    {
        // Region C holds placebo subjects only: the log-rank note names it 'C', not by an index.
        var adsl = Adsl.Replace("T1,T1-002,Placebo,0,Y,B", "T1,T1-002,Placebo,0,Y,C").Replace("T1,T1-008,Active,1,Y,", "T1,T1-008,Active,1,Y,B");
        using var study = new MiniStudy(adsl: adsl, adeff: Adtte, table: Table("""{ "strata": ["REG"] }"""));
        var result = Analyze(study);
        var warnings = TableNotes.Of(result).Warnings;
        Assert.Contains(warnings, w => w.Contains("log-rank test: stratum 'C' has subjects of one group only"));
        Assert.DoesNotContain(warnings, w => w.Contains("stratum 2"));
        // The warning is data: the stratum by its values and the reason as a code, worded by Layout.
        var remark = Assert.Single(result.Notes, n => n.Kind == NoteKind.StratumAddsNothing);
        Assert.Equal(["C"], remark.Subject.Stratum!);
        Assert.Equal("one-group-only", remark.Text("reason"));
    }

    [Fact]
    public void A_censoring_value_other_than_0_or_1_is_a_clear_error()
    {
        using var study = new MiniStudy(adsl: Adsl, adeff: Adtte.Replace("T1-001,TTE,2,0", "T1-001,TTE,2,2"), table: Table("{}"));
        var error = Assert.Throws<SpecException>(() => Analyze(study));
        Assert.Contains("T1-001", error.Message);
        Assert.Contains("CNSR", error.Message);
    }
}
