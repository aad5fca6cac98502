using System.Globalization;
using System.Text;
using OutputForge.Stats.Exact;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Demographics;

/// <summary>
/// A demographics block whose Fisher's exact test is beyond exact enumeration (5 levels x 3 arms, 3,000 invented subjects):
/// the study's "exactTests" chooses the Monte Carlo estimate (the default, named in the footnotes with its interval,
/// samples and seed) or NE.
/// </summary>
public sealed class FisherMonteCarloFallbackTests
{
    /// <summary>Subjects per race level (rows) and arm (columns): spread evenly, the hard case for the network algorithm.</summary>
    private static readonly int[,] Counts = { { 200, 210, 190 }, { 205, 195, 200 }, { 198, 202, 200 }, { 210, 190, 200 }, { 187, 213, 200 } };

    private static readonly string[] Arms = ["Placebo", "Low", "High"];

    private static string Study(string exactTests) => $$"""
        {
          "study": { "id": "T3", "title": "Large categorical test study" },
          "data": { "folder": "data", "datasets": { "adsl": "adsl.csv" } },
          "treatment": { "variable": "TRT01P", "order": "TRT01PN", "control": "Placebo" },
          "populations": { "itt": { "label": "ITT Population", "where": "ITTFL = 'Y'" } },
          {{exactTests}}
          "tables": ["t.json"]
        }
        """;

    private const string Table = """
        {
          "id": "1", "title": ["Demographics"], "population": "itt", "kind": "demographics",
          "demographics": { "variables": [ { "variable": "RACE", "type": "categorical", "label": "Race, n (%)", "orderBy": "RACEN", "test": "fisher" } ] }
        }
        """;

    private static OutputForge.Results.TableResult Analyze(string exactTests)
    {
        using var folder = new TempFolder();
        folder.Write("study.json", Study(exactTests));
        folder.Write("t.json", Table);
        var adsl = new StringBuilder("STUDYID,USUBJID,TRT01P,TRT01PN,ITTFL,RACE,RACEN\n");
        var subject = 0;
        for (var level = 0; level < Counts.GetLength(0); level++)
        {
            for (var arm = 0; arm < Arms.Length; arm++)
            {
                for (var k = 0; k < Counts[level, arm]; k++)
                {
                    adsl.Append(CultureInfo.InvariantCulture, $"T3,T3-{++subject:D5},{Arms[arm]},{arm},Y,RACE {level + 1},{level + 1}\n");
                }
            }
        }
        folder.Write("data/adsl.csv", adsl.ToString());
        var package = OutputForge.Spec.SpecLoader.Load(folder.Path);
        var data = OutputForge.Data.StudyData.Load(package.Study, folder.File("data"));
        return OutputForge.Kinds.TableKinds.For(package.Tables[0]).Analysis.Analyze(package.Study, package.Tables[0], data);
    }

    private static OutputForge.Results.StatisticValue PValue(OutputForge.Results.TableResult result) =>
        result.Rows.SelectMany(r => r.Cells).SelectMany(c => c.Values).Single(v => v.Statistic == "pValue");

    [Fact]
    public void By_default_the_p_value_is_the_seeded_monte_carlo_estimate_and_the_footnotes_say_so()
    {
        var result = Analyze("");

        var expected = FisherMonteCarlo.Estimate(Counts, FisherMonteCarloSettings.Default);
        Assert.Equal(expected.PValue, PValue(result).Value);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("Monte Carlo estimate (Agresti, Wackerly and Boyett 1979)", StringComparison.Ordinal)
                                              && w.Contains("from 100,000 tables sampled with the observed margins (Patefield 1981), seed 20261201", StringComparison.Ordinal));
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Footnotes, f => f.Contains(FisherExactTest.MonteCarloMethodName + " for Race, n (%)", StringComparison.Ordinal));
    }

    [Fact]
    public void The_study_sets_samples_and_seed()
    {
        var result = Analyze("\"exactTests\": { \"samples\": 5000, \"seed\": 7 },");

        Assert.Equal(FisherMonteCarlo.Estimate(Counts, new FisherMonteCarloSettings(5000, 7)).PValue, PValue(result).Value);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("from 5,000 tables sampled with the observed margins (Patefield 1981), seed 7", StringComparison.Ordinal));
    }

    [Fact]
    public void A_study_that_forbids_the_estimate_keeps_NE_with_the_reason()
    {
        var result = Analyze("\"exactTests\": { \"fallback\": \"not-estimable\" },");

        Assert.Null(PValue(result).Value);
        Assert.Contains(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("Fisher's exact test not estimable: the table is too large for exact enumeration", StringComparison.Ordinal));
        Assert.DoesNotContain(OutputForge.Layout.TableNotes.Of(result).Warnings, w => w.Contains("Monte Carlo", StringComparison.Ordinal));
    }
}
