using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Oracles;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.TimeToEvent;

/// <summary>
/// Tables 14.2.3.1 (time to first itch response: stratified log-rank, Cox with Efron ties, event
/// probabilities) and 14.2.3.2 (time to discontinuation: unstratified, Breslow ties) of the demo package
/// against R 4.2.2 survival 3.5.3: survfit(conf.type = "log-log") with quantile() and summary(times =),
/// survdiff and coxph (generate_demo_efficacy_oracles.R).
/// </summary>
public sealed class DemoTimeToEventTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    [Fact]
    public void Time_to_response_matches_r_survival() => DemoEfficacyOracle.AssertAgrees(demo, "14.2.3.1", 1e-8);

    [Fact]
    public void Time_to_discontinuation_matches_r_survival() => DemoEfficacyOracle.AssertAgrees(demo, "14.2.3.2", 1e-8);

    [Fact]
    public void A_median_not_reached_prints_ne_and_is_explained()
    {
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.2.3.2.docx"));
        Assert.Equal(["Median", "NE", "NE", "NE"], rows.First(r => r[0] == "Median"));
        Assert.Equal("(NE, NE)", rows.First(r => r[0] == "95% CI")[1]);
    }
}
