using OutputForge.Kinds.TimeToEvent;
using OutputForge.Tests.Oracles;

namespace OutputForge.Tests.TimeToEvent;

/// <summary>
/// The time-to-event kind on the CDISC pilot study's time to first dermatologic event (ADTTE PARAMCD TTDE,
/// safety population by TRT01A) against R 4.2.2 survival 3.5.3 survfit (log-log), survdiff and coxph with
/// Efron ties (generate_demo_efficacy_oracles.R, pilot_efficacy_oracles.json).
/// </summary>
public sealed class PilotTimeToEventTableTests
{
    private const string Table = """
        {
          "id": "P2", "title": ["Time to first dermatologic event"], "population": "safety", "kind": "time-to-event",
          "endpoint": { "dataset": "adtte", "parameter": "TTDE" },
          "timeToEvent": { "times": [30, 60, 90, 180] }
        }
        """;

    [PilotDataFact]
    public void Time_to_first_dermatologic_event_matches_r_survival() =>
        DemoEfficacyOracle.AssertAgrees(PilotStudy.Analyze(new TimeToEventAnalysis(), Table), "pilot_efficacy_oracles.json", "pilot-ttde", 1e-8);
}
