using OutputForge.Layout;
using OutputForge.Tests.Support;

namespace OutputForge.Tests.Demographics;

/// <summary>The demographics kind on the hand-countable <see cref="SummaryStudy"/> (ITT: S01-S03 placebo, S05-S08 active).</summary>
public sealed class DemographicsAnalysisTests
{
    private const string Table = """
        {
          "id": "14.1.3", "title": ["Demographics"], "population": "itt", "kind": "demographics",
          "demographics": {
            "variables": [
              { "variable": "AGE", "type": "continuous", "label": "Age", "rows": ["n", "mean (sd)", "median", "q1, q3", "min - max"], "test": "anova" },
              { "variable": "SEX", "type": "categorical", "label": "Sex", "test": "chi-square" },
              { "variable": "WEIGHTBL", "type": "continuous", "label": "Weight", "missing": true }
            ],
            "total": true
          }
        }
        """;

    [Fact]
    public void Summarizes_a_continuous_variable_with_the_precision_rule()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        // Placebo ages 30, 41, 52: mean 41, SD 11. Active 35, 46, 57, 68: mean 51.5, SD sqrt(605 / 3) = 14.2009
        // (hand computation). Integer data: mean and median 1 decimal, SD 2, min and max none (common practice).
        Assert.Equal("3", SummaryStudy.Displayed(result, "age/n", "placebo"));
        Assert.Equal("41.0 (11.00)", SummaryStudy.Displayed(result, "age/mean-sd", "placebo"));
        Assert.Equal("51.5 (14.20)", SummaryStudy.Displayed(result, "age/mean-sd", "active"));
        Assert.Equal("51.5", SummaryStudy.Displayed(result, "age/median", "active"));
        // Quartiles, Hyndman-Fan type 2 (numpy 1.24.2 quantile method 'averaged_inverted_cdf': 40.5, 62.5).
        Assert.Equal("40.5, 62.5", SummaryStudy.Displayed(result, "age/q1-q3", "active"));
        Assert.Equal("35 - 68", SummaryStudy.Displayed(result, "age/min-max", "active"));
        Assert.Equal("Min - Max", result.Rows.Single(r => r.Key == "age/min-max").Label);
    }

    [Fact]
    public void Tests_continuous_variables_by_one_way_anova()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        // scipy 1.10.1: stats.f_oneway([30, 41, 52], [35, 46, 57, 68]) = F 1.115702479338843, p 0.3391863660284118.
        Assert.Equal(1.115702479338843, SummaryStudy.Value(result, "age", "p-value", "statistic")!.Value, 12);
        Assert.Equal(0.3391863660284118, SummaryStudy.Value(result, "age", "p-value", "pValue")!.Value, 12);
        Assert.Equal("0.339", SummaryStudy.Displayed(result, "age", "p-value"));
    }

    [Fact]
    public void Summarizes_a_categorical_variable_and_tests_it_by_chi_square_with_its_warning()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        Assert.Equal("2 (66.7)", SummaryStudy.Displayed(result, "sex/f", "placebo"));
        Assert.Equal("1 (25.0)", SummaryStudy.Displayed(result, "sex/m", "active"));
        Assert.Equal("5 (71.4)", SummaryStudy.Displayed(result, "sex/f", "total"));
        // scipy 1.10.1: stats.chi2_contingency([[2, 3], [1, 1]], correction=False) = 0.05833333333333332, p 0.809149834631498.
        Assert.Equal(0.809149834631498, SummaryStudy.Value(result, "sex", "p-value", "pValue")!.Value, 12);
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.StartsWith("Sex: 4 of 4 expected counts are below 5", StringComparison.Ordinal));
    }

    [Fact]
    public void Detects_the_data_decimals_and_counts_missing_values()
    {
        using var study = new SummaryStudy(Table);
        var result = study.Analyze();
        // Placebo weights 60.5 and 70.0 (S03 missing): one data decimal, so the mean 65.25 shows with 2.
        Assert.Equal("2", SummaryStudy.Displayed(result, "weightbl/n", "placebo"));
        Assert.Equal("65.25", SummaryStudy.Displayed(result, "weightbl/median", "placebo"));
        Assert.Equal("60.5, 70.0", SummaryStudy.Displayed(result, "weightbl/min-max", "placebo"));
        Assert.Equal(1, SummaryStudy.Value(result, "weightbl/missing", "placebo", "n"));
    }

    [Fact]
    public void Decimals_set_in_the_spec_override_the_rule_and_round_half_away_from_zero()
    {
        using var study = new SummaryStudy(Table.Replace("\"label\": \"Weight\", \"missing\": true", "\"label\": \"Weight\", \"decimals\": { \"mean\": 1 }"));
        var result = study.Analyze();
        // 65.25 is a decimal midpoint: half away from zero gives 65.3 (banker's rounding would give 65.2).
        Assert.Equal("65.3 (6.718)", SummaryStudy.Displayed(result, "weightbl/mean-sd", "placebo"));
    }

    [Fact]
    public void A_median_on_a_decimal_midpoint_rounds_half_away_from_zero()
    {
        // Placebo weights 0.6 and 0.7: the median is 0.65, which shows as 0.7 with one decimal. Averaged in binary
        // it would be 0.6499999999999999 (IEEE 754 double) and show as 0.6.
        var adsl = SummaryStudy.Adsl.Replace(",F,60.5,", ",F,0.6,").Replace(",M,70.0,", ",M,0.7,");
        using var study = new SummaryStudy(Table.Replace("\"label\": \"Weight\", \"missing\": true", "\"label\": \"Weight\", \"decimals\": { \"median\": 1 }"), adsl);
        Assert.Equal("0.7", SummaryStudy.Displayed(study.Analyze(), "weightbl/median", "placebo"));
    }

    [Fact]
    public void Levels_follow_the_spec_list_and_unlisted_values_are_shown_with_a_warning()
    {
        using var study = new SummaryStudy(Table.Replace("\"label\": \"Sex\",", "\"label\": \"Sex\", \"levels\": [ { \"value\": \"M\", \"label\": \"Male\" }, { \"value\": \"U\" } ],"));
        var result = study.Analyze();
        Assert.Equal(["sex/m", "sex/u", "sex/f"], result.Rows.Where(r => r.Key.StartsWith("sex/", StringComparison.Ordinal)).Select(r => r.Key));
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.Contains("SEX value 'F' is not in the spec's levels"));
        Assert.Contains(TableNotes.Of(result).Warnings, w => w.Contains("SEX level 'U' has no subjects"));
    }

    [Fact]
    public void The_retired_row_statistic_geomean_gets_an_error_naming_geometric_mean()
    {
        using var study = new SummaryStudy(Table.Replace("\"min - max\"]", "\"min - max\", \"geomean\"]"));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("the statistic 'geomean' in row \"geomean\" is now called 'geometric-mean'", error.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Geometric_mean_and_coefficient_of_variation_rows()
    {
        using var study = new SummaryStudy(Table.Replace("\"min - max\"]", "\"min - max\", \"geometric-mean\", \"cv\"]"));
        var result = study.Analyze();
        // R 4.2.2: exp(mean(log(c(30, 41, 52)))) = 39.99166493, exp(mean(log(c(35, 46, 57, 68)))) = 49.9807088384;
        // 100 * sd / mean = 26.8292682927 and 27.5746387109. Decimals: geometric mean as the mean (1 for integer data),
        // CV% one (common practice).
        Assert.Equal(39.99166493, SummaryStudy.Value(result, "age/geometric-mean", "placebo", "geometricMean")!.Value, 8);
        Assert.Equal(27.5746387109, SummaryStudy.Value(result, "age/cv", "active", "cv")!.Value, 9);
        Assert.Equal("40.0", SummaryStudy.Displayed(result, "age/geometric-mean", "placebo"));
        Assert.Equal("50.0", SummaryStudy.Displayed(result, "age/geometric-mean", "active"));
        Assert.Equal("26.8", SummaryStudy.Displayed(result, "age/cv", "placebo"));
        Assert.Equal("Geometric mean", result.Rows.Single(r => r.Key == "age/geometric-mean").Label);
        Assert.Equal("CV%", result.Rows.Single(r => r.Key == "age/cv").Label);
    }

    [Fact]
    public void An_unknown_statistic_in_a_row_is_a_located_spec_error()
    {
        using var study = new SummaryStudy(Table.Replace("\"min - max\"", "\"range\""));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("unknown statistic 'range'", error.Message);
        Assert.Contains("$.demographics.variables[0].rows[4]", error.Message);
    }

    [Fact]
    public void A_text_variable_cannot_be_summarized_as_continuous()
    {
        using var study = new SummaryStudy(Table.Replace("{ \"variable\": \"SEX\", \"type\": \"categorical\", \"label\": \"Sex\", \"test\": \"chi-square\" }",
            "{ \"variable\": \"SEX\", \"type\": \"continuous\" }"));
        var error = Assert.Throws<OutputForge.Spec.SpecException>(study.Analyze);
        Assert.Contains("SEX is not numeric", error.Message);
    }
}
