using OutputForge.Tests.EndToEnd;
using OutputForge.Tests.Oracles;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Continuous;

/// <summary>
/// Table 14.2.2.1 of the demo package (itch score change from baseline by visit, ANCOVA with BASE,
/// STRAT1R and STRAT2R) against R 4.2.2: mean, sd, median, min, max, and lm() with LS means computed by
/// hand from coef() and vcov() (generate_demo_efficacy_oracles.R).
/// </summary>
public sealed class DemoContinuousTableTests(DemoRunFixture demo) : IClassFixture<DemoRunFixture>
{
    [Fact]
    public void Descriptive_statistics_ls_means_differences_and_dose_response_match_r() =>
        DemoEfficacyOracle.AssertAgrees(demo, "14.2.2.1", 1e-9);

    [Fact]
    public void The_word_table_shows_the_ls_mean_difference_rounded_half_away_from_zero()
    {
        var rows = DocumentReader.WordTableRows(demo.Output("table-14.2.2.1.docx"));
        var lsmean = rows.First(r => r[0] == "LS mean (SE)");
        Assert.Equal(4, lsmean.Count);
        Assert.All(lsmean.Skip(1), cell => Assert.Matches(@"^-?\d+\.\d\d \(\d+\.\d{3}\)$", cell));
    }
}
