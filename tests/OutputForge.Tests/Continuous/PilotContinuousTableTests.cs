using OutputForge.Kinds.Continuous;
using OutputForge.Tests.Oracles;

namespace OutputForge.Tests.Continuous;

/// <summary>
/// The continuous kind on the CDISC pilot study's CIBIC+ score at Week 24 (ADQSCIBC, ANL01FL = Y, efficacy
/// population; no baseline, so the model analyses the value) with pooled site group SITEGR1 as a factor and
/// TRT01PN for the dose-response test, against R 4.2.2 lm() with LS means by hand
/// (generate_demo_efficacy_oracles.R, pilot_efficacy_oracles.json).
/// </summary>
public sealed class PilotContinuousTableTests
{
    private const string Table = """
        {
          "id": "P1", "title": ["CIBIC+"], "population": "efficacy", "kind": "continuous",
          "endpoint": { "dataset": "adqscibc", "parameter": "CIBICVAL", "where": "ANL01FL = 'Y'" },
          "continuous": {
            "visits": ["Week 24"], "baseline": null, "change": null, "decimals": 0,
            "model": { "factors": ["SITEGR1"], "doseVariable": "TRT01PN" }
          }
        }
        """;

    [PilotDataFact]
    public void Cibic_week_24_ancova_matches_r_lm() =>
        DemoEfficacyOracle.AssertAgrees(PilotStudy.Analyze(new ContinuousAnalysis(), Table), "pilot_efficacy_oracles.json", "pilot-cibic", 1e-9);
}
