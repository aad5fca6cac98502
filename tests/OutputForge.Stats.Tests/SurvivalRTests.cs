namespace OutputForge.Stats.Tests;

/// <summary>
/// Kaplan-Meier, log-rank and Cox on Oracles/efficacy_tte_data.csv (invented: 180 subjects, 3 arms,
/// 2 strata, whole days with many ties, drawn by generate_efficacy_oracles.R) against R 4.2.2 survival 3.5.3.
/// </summary>
public sealed class SurvivalRTests
{
    private static readonly SurvivalReference.Subjects Subjects =
        SurvivalReference.FromRows(EfficacyOracles.ReadCsv("efficacy_tte_data.csv"), "ARM", "STRAT");

    private static System.Text.Json.JsonElement Block(string name) => EfficacyOracles.Root.GetProperty("timeToEvent").GetProperty(name);

    [Theory]
    [InlineData("P")]
    [InlineData("L")]
    [InlineData("H")]
    public void Kaplan_meier_median_interval_and_estimates_match_survfit(string arm) =>
        SurvivalReference.CheckKaplanMeier(Subjects, arm, Block("km").GetProperty(arm));

    [Fact]
    public void Three_group_log_rank_matches_survdiff()
    {
        SurvivalReference.CheckLogRank(Subjects, ["P", "L", "H"], false, Block("logrank3"));
        SurvivalReference.CheckLogRank(Subjects, ["P", "L", "H"], true, Block("logrank3Stratified"));
    }

    [Theory]
    [InlineData("LvsP", "L")]
    [InlineData("HvsP", "H")]
    public void Pairwise_log_rank_matches_survdiff(string block, string active)
    {
        SurvivalReference.CheckLogRank(Subjects, ["P", active], false, Block(block).GetProperty("logrank"));
        SurvivalReference.CheckLogRank(Subjects, ["P", active], true, Block(block).GetProperty("logrankStratified"));
    }

    [Theory]
    [InlineData("LvsP", "L")]
    [InlineData("HvsP", "H")]
    public void Cox_hazard_ratio_matches_coxph_with_efron_and_breslow_ties(string block, string active)
    {
        var b = Block(block);
        SurvivalReference.CheckCox(Subjects, active, "P", CoxTies.Efron, false, b.GetProperty("coxEfron"));
        SurvivalReference.CheckCox(Subjects, active, "P", CoxTies.Breslow, false, b.GetProperty("coxBreslow"));
        SurvivalReference.CheckCox(Subjects, active, "P", CoxTies.Efron, true, b.GetProperty("coxEfronStratified"));
        SurvivalReference.CheckCox(Subjects, active, "P", CoxTies.Breslow, true, b.GetProperty("coxBreslowStratified"));
    }
}
