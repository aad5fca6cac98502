using OutputForge.Tests.Support;

namespace OutputForge.Tests.Populations;

/// <summary>The populations kind on the hand-countable <see cref="SummaryStudy"/>.</summary>
public sealed class PopulationsAnalysisTests
{
    private const string Table = """
        {
          "id": "14.1.1", "title": ["Populations"], "population": "randomized", "kind": "populations",
          "populations": {
            "rows": [
              { "population": "itt" },
              { "population": "safety", "label": "Safety" },
              { "key": "completers", "label": "Completed the study", "where": "EOSSTT = 'COMPLETED'" }
            ],
            "total": true
          }
        }
        """;

    [Fact]
    public void Counts_each_population_among_the_randomized_subjects_of_each_planned_arm()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        Assert.Equal(["placebo", "active", "total"], result.Columns.Select(c => c.Key));
        Assert.Equal([4, 4, 8], result.Columns.Select(c => c.SubjectCount!.Value));
        // ITT: S01-S03 of placebo (S04 is not), all four active; safety: S01, S02 and all active.
        Assert.Equal("3 (75.0)", SummaryStudy.Displayed(result, "itt", "placebo"));
        Assert.Equal("4 (100.0)", SummaryStudy.Displayed(result, "itt", "active"));
        Assert.Equal("7 (87.5)", SummaryStudy.Displayed(result, "itt", "total"));
        Assert.Equal("2 (50.0)", SummaryStudy.Displayed(result, "safety", "placebo"));
        Assert.Equal("6 (75.0)", SummaryStudy.Displayed(result, "safety", "total"));
        Assert.Equal("Safety", result.Rows.Single(r => r.Key == "safety").Label);
        Assert.Equal("2 (50.0)", SummaryStudy.Displayed(result, "completers", "placebo"));
        Assert.Equal("3 (75.0)", SummaryStudy.Displayed(result, "completers", "active"));
    }

    [Fact]
    public void The_total_column_follows_the_study_unless_the_table_says()
    {
        using var study = new SummaryStudy(Table.Replace("\"total\": true", "\"total\": false"));
        Assert.DoesNotContain(study.Analyze().Columns, c => c.Key == "total");
    }

    [Fact]
    public void An_unknown_population_row_is_a_located_spec_error()
    {
        using var study = new SummaryStudy(Table.Replace("{ \"population\": \"itt\" }", "{ \"population\": \"itx\" }"));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("unknown population 'itx' (did you mean 'itt'?)", error.Message);
        Assert.Contains("$.populations.rows[0].population", error.Message);
    }

    [Fact]
    public void A_row_with_both_a_population_and_a_condition_is_refused_by_the_schema()
    {
        using var study = new SummaryStudy(Table.Replace("{ \"population\": \"itt\" }", "{ \"population\": \"itt\", \"where\": \"AGE > 40\" }"));
        Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
    }

    [Fact]
    public void A_kind_without_its_settings_is_refused_by_the_schema()
    {
        using var study = new SummaryStudy("""{ "id": "1", "title": ["x"], "population": "itt", "kind": "populations" }""");
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("populations", error.Message);
    }
}
