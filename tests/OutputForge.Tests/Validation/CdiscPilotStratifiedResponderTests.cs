using System.Text.Json;
using OutputForge.Kinds.Responders;
using OutputForge.Data;
using OutputForge.Results;
using OutputForge.Spec;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Validation;

/// <summary>
/// The stratified responder analysis on the public CDISC pilot data, with the spec
/// specs/validation/cdiscpilot01/cibic-study.json: CIBIC+ improved (AVAL &lt;= 3) at Week 24, observed cases
/// (ANL01FL = 'Y', the dataset's own LOCF records included), each Xanomeline arm against Placebo, stratified by
/// SITEGR1. Source of the expected values: R 4.2.2 mantelhaen.test (correct = FALSE), computed from the CSV
/// files by Validation/Oracles/cdiscpilot_cibic_cmh.R, values in Validation/Oracles/cdiscpilot_cibic_cmh.json.
/// </summary>
public sealed class CdiscPilotStratifiedResponderTests
{
    private static readonly (string Arm, string Key)[] Arms = [("Xanomeline Low Dose", "xanomeline-low-dose"), ("Xanomeline High Dose", "xanomeline-high-dose")];

    private static TableResult Analyze()
    {
        var package = SpecLoader.Load(Path.Combine(CdiscPilotFiles.Specs, "cibic-study.json"));
        var data = StudyData.Load(package.Study, CdiscPilotCibicFactAttribute.DataFolder!);
        return new ResponderAnalysis().Analyze(package.Study, package.Tables[0], data);
    }

    private static JsonElement Oracle(string arm) => JsonDocument.Parse(File.ReadAllText(Path.Combine(
        RepositoryRoot.Path, "tests", "OutputForge.Tests", "Validation", "Oracles", "cdiscpilot_cibic_cmh.json"))).RootElement.GetProperty(arm);

    private static double Value(TableResult result, string row, string column, string statistic) =>
        result.Rows.Single(r => r.Key == row).Cells.Single(c => c.Column == column).Values.Single(v => v.Statistic == statistic).Value!.Value;

    [CdiscPilotCibicFact]
    public void Cmh_test_and_mantel_haenszel_odds_ratio_match_r_mantelhaen_test()
    {
        var result = Analyze();
        foreach (var (arm, key) in Arms)
        {
            var r = Oracle(arm);
            Assert.Equal(r.GetProperty("statistic").GetDouble(), Value(result, "cmh-p-value", key, "statistic"), 1e-10);
            Assert.Equal(r.GetProperty("p").GetDouble(), Value(result, "cmh-p-value", key, "pValue"), 1e-10);
            Assert.Equal(r.GetProperty("or").GetDouble(), Value(result, "odds-ratio", key, "estimate"), 1e-10);
            Assert.Equal(r.GetProperty("or_lower").GetDouble(), Value(result, "odds-ratio-ci", key, "lower"), 1e-9);
            Assert.Equal(r.GetProperty("or_upper").GetDouble(), Value(result, "odds-ratio-ci", key, "upper"), 1e-9);
            Assert.Equal(r.GetProperty("strata").GetArrayLength(), Value(result, "cmh-p-value", key, "strata"));
        }
    }

    [CdiscPilotCibicFact]
    public void Observed_cases_count_the_subjects_with_a_record_as_r_does()
    {
        var result = Analyze();
        foreach (var (arm, key) in Arms)
        {
            var strata = Oracle(arm).GetProperty("strata").EnumerateArray().ToList();
            Assert.Equal(strata.Sum(s => s[2].GetInt32()), Value(result, "evaluated", key, "n"));
            Assert.Equal(strata.Sum(s => s[1].GetInt32()), Value(result, "responders", key, "n"));
            Assert.Equal(strata.Sum(s => s[4].GetInt32()), Value(result, "evaluated", "placebo", "n"));
        }
        // The dataset's own LOCF records are counted and shown.
        Assert.True(result.Columns.Sum(c => Value(result, "derived", c.Key, "n")) > 0);
    }

    [CdiscPilotCibicFact]
    public void A_stratum_left_out_of_the_breslow_day_test_is_named_in_the_run_log()
    {
        var result = Analyze();
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.StartsWith("Xanomeline High Dose vs Placebo: Stratum 718 ", StringComparison.Ordinal));
    }
}
