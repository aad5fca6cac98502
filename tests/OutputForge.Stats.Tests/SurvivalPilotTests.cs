namespace OutputForge.Stats.Tests;

/// <summary>
/// The CDISC pilot study's ADTTE (time to first dermatologic event, PARAMCD TTDE, by TRTAN 0 / 54 / 81),
/// read from ../shared/data/cdiscpilot01/csv/adtte.csv, against R 4.2.2 survival 3.5.3 values that
/// generate_efficacy_oracles.R computed from the same file.
/// </summary>
public sealed class SurvivalPilotTests
{
    private const string File = "data/cdiscpilot01/csv/adtte.csv";

    private static SurvivalReference.Subjects Pilot() =>
        SurvivalReference.FromRows(EfficacyOracles.ReadCsvFile(SharedFile.Find(File)!).Where(r => r["PARAMCD"] == "TTDE"), "TRTAN", null);

    private static System.Text.Json.JsonElement Block(string name) => EfficacyOracles.Root.GetProperty("pilotAdtte").GetProperty(name);

    [SharedFileFact(File)]
    public void Kaplan_meier_per_arm_matches_survfit()
    {
        var pilot = Pilot();
        foreach (var arm in new[] { "0", "54", "81" })
        {
            SurvivalReference.CheckKaplanMeier(pilot, arm, Block("km").GetProperty(arm));
        }
    }

    [SharedFileFact(File)]
    public void Log_rank_matches_survdiff()
    {
        var pilot = Pilot();
        SurvivalReference.CheckLogRank(pilot, ["0", "54", "81"], false, Block("logrank3"));
        SurvivalReference.CheckLogRank(pilot, ["0", "54"], false, Block("d54vs0").GetProperty("logrank"));
        SurvivalReference.CheckLogRank(pilot, ["0", "81"], false, Block("d81vs0").GetProperty("logrank"));
    }

    [SharedFileFact(File)]
    public void Cox_hazard_ratios_match_coxph()
    {
        var pilot = Pilot();
        foreach (var (block, active) in new[] { ("d54vs0", "54"), ("d81vs0", "81") })
        {
            SurvivalReference.CheckCox(pilot, active, "0", CoxTies.Efron, false, Block(block).GetProperty("coxEfron"));
            SurvivalReference.CheckCox(pilot, active, "0", CoxTies.Breslow, false, Block(block).GetProperty("coxBreslow"));
        }
    }
}
